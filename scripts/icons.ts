// Renders the app icons in static/icons/ from static/icons/beadline.svg (run after changing the
// drawing: `npx tsx scripts/icons.ts`; the PNGs are committed, the build does not make them).
import { readFileSync } from 'node:fs';
import sharp from 'sharp';

const svg = readFileSync('static/icons/beadline.svg');
const sizes: [string, number][] = [
	['icon-192.png', 192],
	['icon-512.png', 512],
	['apple-touch-icon.png', 180]
];
for (const [name, size] of sizes) {
	await sharp(svg, { density: 300 })
		.resize(size, size)
		.png({ compressionLevel: 9 })
		.toFile(`static/icons/${name}`);
	console.log(`static/icons/${name} ${size}×${size}`);
}
