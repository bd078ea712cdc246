// The shop's one default code read in each form's words (issue 15). No welding values: the
// mapping is Beadline's own (ISO 15609-1 is the WPS standard, ISO 15614-1 the procedure test,
// ISO 9606-1 the welder test; common practice, no source).
import { describe, expect, it } from 'vitest';
import {
	asPqrCode,
	pqrCodeFor,
	pqrCodeLabel,
	procedureCodeFor,
	qualificationCodeFor
} from './default-code';

describe('the shop default on each form', () => {
	it('ISO: the WPS follows ISO 15609-1, the PQR ISO 15614-1, the welder ISO 9606-1', () => {
		expect(procedureCodeFor('iso-15614-1')).toBe('iso-15609-1');
		expect(pqrCodeFor('iso-15614-1')).toBe('iso-15614-1');
		expect(qualificationCodeFor('iso-15614-1')).toBe('ISO 9606-1');
	});
	it('ASME IX and D1.1 read the same everywhere', () => {
		expect(procedureCodeFor('aws-d1.1')).toBe('aws-d1.1');
		expect(qualificationCodeFor('aws-d1.1')).toBe('AWS D1.1');
		expect(qualificationCodeFor('asme-ix')).toBe('ASME IX');
	});
	it('anything else reads as ASME IX (what Beadline judged by before), and never throws', () => {
		for (const x of [undefined, null, '', 'iso', 42, {}, 'asme-ix+iso'])
			expect(procedureCodeFor(x)).toBe('asme-ix');
		expect(asPqrCode('asme-ix+iso')).toBe('asme-ix+iso');
		expect(asPqrCode('nonsense')).toBe('asme-ix');
		expect(pqrCodeLabel('asme-ix+iso')).toContain('both codes');
		expect(pqrCodeLabel(null)).toBe('');
	});
});
