import { describe, expect, it } from 'vitest';
import { demoSeedRefusal } from './seed-guard';

const file = '/srv/beadline/beadline.sqlite';

describe('db:seed refuses outside a demo, development or test environment', () => {
	it('seeds a demo (BEADLINE_DEMO=1), development or test database', () => {
		expect(demoSeedRefusal({ demo: true, nodeEnv: undefined, databaseFile: file })).toBeNull();
		expect(demoSeedRefusal({ demo: true, nodeEnv: 'production', databaseFile: file })).toBeNull();
		expect(demoSeedRefusal({ demo: false, nodeEnv: 'development', databaseFile: file })).toBeNull();
		expect(demoSeedRefusal({ demo: false, nodeEnv: ' Test ', databaseFile: file })).toBeNull();
	});
	it('refuses otherwise, naming the file and how to seed a demo on purpose', () => {
		for (const nodeEnv of [undefined, '', 'production', 'staging']) {
			const why = demoSeedRefusal({ demo: false, nodeEnv, databaseFile: file });
			expect(why, String(nodeEnv)).toContain(`Refusing to seed ${file}`);
			expect(why).toContain('known demo passwords');
			expect(why).toContain('BEADLINE_DEMO=1 npm run db:seed');
		}
		expect(demoSeedRefusal({ demo: false, nodeEnv: 'production', databaseFile: file })).toContain(
			'NODE_ENV is "production"'
		);
	});
});
