// Accessibility: axe-core (WCAG 2.1 A and AA rules) on every main page, as the role that uses it,
// in Chromium. No serious or critical violation; the minor and moderate ones are counted.
import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { demoParams } from './support/demo-params';
import { cookieOf, origin } from './support/http';
import { admin, engineer, inspector, welder } from './support/people';
import { fillPath } from './support/routes';
import { join } from 'node:path';

type Who = 'anonymous' | 'admin' | 'engineer' | 'inspector' | 'welder';
const PEOPLE = { admin, engineer, inspector, welder };

/** The main pages, each seen by the person who works in it. */
const PAGES: [Who, string][] = [
	['anonymous', '/signin'],
	['anonymous', '/signup'],
	['anonymous', '/help/checks'],
	['anonymous', '/b/[token]'],
	['admin', '/admin'],
	['admin', '/admin/people'],
	['admin', '/admin/people/[id=uuid]'],
	['admin', '/admin/shop'],
	['admin', '/admin/tokens'],
	['admin', '/admin/audit'],
	['engineer', '/records'],
	['engineer', '/records/new'],
	['engineer', '/records/[id=id]'],
	['engineer', '/records/[id=id]/edit'],
	['engineer', '/records/plot'],
	['engineer', '/procedures'],
	['engineer', '/procedures/new'],
	['engineer', '/procedures/[id=id]'],
	['engineer', '/procedures/[id=id]/revisions/[rev=id]'],
	['engineer', '/pqrs'],
	['engineer', '/pqrs/[id=id]'],
	['engineer', '/welders'],
	['engineer', '/welders/[id=id]'],
	['engineer', '/profile'],
	['inspector', '/reviews'],
	['inspector', '/procedures/[id=id]/revisions/[rev=id]/review'],
	['welder', '/booth'],
	['welder', '/welders/me'],
	['welder', '/b/[token]']
];

async function as(page: Page, who: Who): Promise<void> {
	if (who === 'anonymous') return;
	const [name, ...rest] = (await cookieOf(PEOPLE[who])).split('=');
	await page.context().addCookies([{ name: name!, value: rest.join('='), url: origin() }]);
}

for (const [who, pattern] of PAGES) {
	test(`axe: ${pattern} as ${who}`, async ({ page }) => {
		const paramsFor = await demoParams(join(process.env.E2E_DATA_DIR ?? '', 'beadline.sqlite'));
		const path = fillPath(pattern, paramsFor(pattern));
		await as(page, who);
		if (pattern.startsWith('/b/') || who === 'welder')
			await page.setViewportSize({ width: 412, height: 915 });
		const res = await page.goto(path);
		expect(res?.status(), path).toBe(200);
		const r = await new AxeBuilder({ page })
			.withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
			.analyze();
		const bad = r.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
		const summary = bad.map(
			(v) =>
				`${v.impact} ${v.id}: ${v.help} — ${v.nodes
					.map((n) => n.target.join(' '))
					.slice(0, 3)
					.join(' | ')}`
		);
		expect(summary, `${path} as ${who}`).toEqual([]);
		counts.pages++;
		for (const v of r.violations)
			if (v.impact === 'minor' || v.impact === 'moderate') counts[v.impact]++;
	});
}
