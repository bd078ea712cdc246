// The shop's default governing code (shops.default_code, migration 0011) and what it means on
// each form: a WPS names its standard (ISO 15609-1 for an ISO WPS), a PQR the qualification
// standard (ISO 15614-1), a welder qualification the welder standard (ISO 9606-1). One id per
// code is stored for the shop; each form reads it in its own words. Pure.
import type { CodeId } from './options';

export const SHOP_CODES = ['asme-ix', 'aws-d1.1', 'iso-15614-1'] as const;
export type ShopCode = (typeof SHOP_CODES)[number];
export const SHOP_CODE_LABELS: Record<ShopCode, string> = {
	'asme-ix': 'ASME IX (procedures, PQRs and welders)',
	'aws-d1.1': 'AWS D1.1 (procedures, PQRs and welders)',
	'iso-15614-1': 'ISO (WPS to ISO 15609-1, PQR to ISO 15614-1, welders to ISO 9606-1)'
};

/** The codes a PQR may follow; `asme-ix+iso` is one coupon qualified to both at once. */
export const PQR_CODES = ['asme-ix', 'aws-d1.1', 'iso-15614-1', 'asme-ix+iso'] as const;
export type PqrCode = (typeof PQR_CODES)[number];
export const PQR_CODE_LABELS: Record<PqrCode, string> = {
	'asme-ix': 'ASME IX',
	'aws-d1.1': 'AWS D1.1',
	'iso-15614-1': 'ISO 15614-1',
	'asme-ix+iso': 'ASME IX and ISO 15614-1 (one coupon, both codes)'
};

const asShopCode = (x: unknown): ShopCode =>
	typeof x === 'string' && (SHOP_CODES as readonly string[]).includes(x)
		? (x as ShopCode)
		: 'asme-ix';

/** The code a new procedure starts with. */
export const procedureCodeFor = (shop: unknown): CodeId => {
	const c = asShopCode(shop);
	return c === 'iso-15614-1' ? 'iso-15609-1' : c;
};

/** The code a new PQR starts with. */
export const pqrCodeFor = (shop: unknown): PqrCode => asShopCode(shop);

/** The code a new welder qualification starts with (the words of QUALIFICATION_CODES). */
export const qualificationCodeFor = (shop: unknown): 'ASME IX' | 'AWS D1.1' | 'ISO 9606-1' =>
	(({ 'asme-ix': 'ASME IX', 'aws-d1.1': 'AWS D1.1', 'iso-15614-1': 'ISO 9606-1' }) as const)[
		asShopCode(shop)
	];

/** A stored PQR code, read back for its edit form (an unknown one reads as ASME IX). */
export const asPqrCode = (x: unknown): PqrCode =>
	typeof x === 'string' && (PQR_CODES as readonly string[]).includes(x)
		? (x as PqrCode)
		: 'asme-ix';

/** A stored PQR code as shown; an unknown one is shown as stored. */
export const pqrCodeLabel = (code: unknown): string =>
	typeof code === 'string' && Object.hasOwn(PQR_CODE_LABELS, code)
		? PQR_CODE_LABELS[code as PqrCode]
		: String(code ?? '');
