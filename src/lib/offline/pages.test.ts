import { describe, expect, it } from 'vitest';
import { noticesBanner, offlineBanner, queueBanner } from './banners';
import {
	boothTapToken,
	escapeHtml,
	isKeptPath,
	linkedAssets,
	prependToBody,
	stripScripts
} from './pages';

const TOKEN = 'AbCdEfGhIjKlMnOpQrStUvWx';

describe('what a phone keeps', () => {
	it('keeps booth views, the booth page, the own card and card checks; nothing else', () => {
		expect(isKeptPath(`/b/${TOKEN}`)).toBe(true);
		expect(isKeptPath('/booth')).toBe(true);
		expect(isKeptPath('/welders/me')).toBe(true);
		expect(isKeptPath(`/q/${TOKEN}`)).toBe(true);
		for (const p of ['/records', '/admin/people', '/welders/12', `/b/${TOKEN}/x`, '/b/short'])
			expect(isKeptPath(p), p).toBe(false);
	});

	it('knows a booth tap by its action', () => {
		expect(boothTapToken(`/b/${TOKEN}`, '?/used')).toBe(TOKEN);
		expect(boothTapToken(`/b/${TOKEN}`, '')).toBeNull();
		expect(boothTapToken('/welders/me', '?/used')).toBeNull();
	});
});

describe('a kept copy shown offline', () => {
	const page =
		'<html><head><link rel="stylesheet" href="./_app/immutable/assets/0.css">' +
		'<link rel="modulepreload" href="./_app/immutable/entry/start.js">' +
		'<link rel="preload" as="font" href="./_app/immutable/assets/f.woff2" crossorigin>' +
		'</head><body data-sveltekit-preload-data="hover"><div style="display: contents">' +
		'<main id="main">x</main><script nonce="n">import("./start.js")</script></div></body></html>';

	it('loses its scripts but keeps its stylesheets and fonts', () => {
		const plain = stripScripts(page);
		expect(plain).not.toMatch(/<script|modulepreload/);
		expect(plain).toContain('rel="stylesheet"');
		expect(linkedAssets(page)).toEqual([
			'./_app/immutable/assets/0.css',
			'./_app/immutable/assets/f.woff2'
		]);
	});

	it('gets notices first in the body, outside what the app hydrates', () => {
		const out = prependToBody(page, '<p id="n">!</p>');
		expect(out).toContain('<body data-sveltekit-preload-data="hover"><p id="n">!</p><div');
	});

	it('says when it was saved, in the phone’s own time, and what to check', () => {
		const at = new Date('2026-12-03T09:14:00Z');
		const html = offlineBanner(at, 'en-GB');
		expect(html).toContain('datetime="2026-12-03T09:14:00.000Z"');
		expect(html).toContain('saved on this phone on');
		expect(html).toContain('2026');
		expect(html).toContain('ask the inspector');
		expect(html).toContain('role="alert"');
	});

	it('counts the taps waiting, and shows refusals loudly with the text escaped', () => {
		expect(queueBanner(0, false)).toBe('');
		expect(queueBanner(2, true)).toContain('Waiting to send: 2');
		const n = noticesBanner([{ kind: 'refused', message: '<b>withdrawn</b>', madeAt: Date.now() }]);
		expect(n).toContain('Not logged');
		expect(n).toContain(escapeHtml('<b>withdrawn</b>'));
		expect(n).not.toContain('<b>withdrawn');
	});
});
