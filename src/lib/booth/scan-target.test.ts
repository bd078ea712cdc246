import { describe, expect, it } from 'vitest';
import { boothTarget } from './scan-target';

const origin = 'https://shop.example';
const token = 'AbCdEfGhIjKlMnOpQrStUvWx';

describe('boothTarget', () => {
	it('opens a booth link of this site', () => {
		expect(boothTarget(`https://shop.example/b/${token}`, origin)).toBe(`/b/${token}`);
		expect(boothTarget(` /b/${token} `, origin)).toBe(`/b/${token}`);
	});

	it('refuses other sites, other paths and malformed tokens', () => {
		expect(boothTarget(`https://elsewhere.example/b/${token}`, origin)).toBeNull();
		expect(boothTarget(`https://shop.example/q/${token}`, origin)).toBeNull();
		expect(boothTarget('https://shop.example/b/short', origin)).toBeNull();
		expect(boothTarget('javascript:alert(1)', origin)).toBeNull();
		expect(boothTarget('WIFI:S:shop;T:WPA;P:secret;;', origin)).toBeNull();
	});
});
