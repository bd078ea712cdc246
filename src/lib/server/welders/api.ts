// The JSON shapes of /api/v1/welders and how the services' refusals become API answers.
import { ApiFailure } from '../api/respond';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import type { WelderView } from './read';

export function apiRefusal(e: unknown): never {
	if (e instanceof NotFoundError) throw new ApiFailure(404, { message: e.message });
	if (e instanceof ForbiddenError) throw new ApiFailure(403, { message: e.message });
	if (e instanceof RefusedError)
		throw new ApiFailure(400, { errors: { [e.field ?? '']: [e.message] } });
	throw e;
}

const mm = (v: number | null) =>
	v === null ? null : { value: Math.round(v * 1000) / 1000, unit: 'mm' };

/** Quantities carry their unit, as in the checks API. */
export function welderJson(w: WelderView, today: string, detail: boolean) {
	return {
		id: w.id,
		name: w.name,
		stamp: w.stamp,
		active: w.active,
		linkedAccount: w.userId !== null,
		asOf: today,
		qualifications: w.qualifications.map((q) => ({
			id: q.id,
			process: q.process,
			code: q.code,
			testDate: q.testDate,
			testPositions: q.testPositions,
			status: q.status.state,
			lapsesOn: q.status.lapsesOn,
			daysLeft: q.status.daysLeft,
			lastActivity: q.status.lastActivity,
			...(detail
				? {
						wps: q.wpsRef,
						coupon: {
							type: q.couponType,
							thickness: mm(q.couponThicknessMm),
							diameter: mm(q.couponDiameterMm)
						},
						depositThickness: mm(q.depositThicknessMm),
						fNumber: q.fNumber,
						ranges: {
							groove: q.ranges.groove,
							groovePipe: q.ranges.groovePipe,
							fillet: q.ranges.fillet,
							positionsSource: q.ranges.positionsSource,
							depositMax: q.ranges.depositMaxMm === null ? 'unlimited' : mm(q.ranges.depositMaxMm),
							depositSource: q.ranges.depositSource,
							minPipeDiameter: mm(q.ranges.minDiameterMm),
							diameterSource: q.ranges.diameterSource
						}
					}
				: {})
		})),
		...(detail
			? {
					uses: w.uses.map((u) => ({
						process: u.process,
						usedOn: u.usedOn,
						source: u.source,
						note: u.note
					}))
				}
			: {})
	};
}
