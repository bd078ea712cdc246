import { requireRole } from '$lib/server/auth/guards';
import { JOB_VIEW_ROLES, jobView } from '$lib/server/fabrication';
import { revisionLabels } from '$lib/server/fabrication/joint-history';
import { weldLogCsv } from '$lib/server/fabrication/weld-log-csv';
import { rethrowAsHttp } from '$lib/server/people/form-errors';
import type { RequestHandler } from './$types';

// The job's weld log, one line per logged pass.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...JOB_VIEW_ROLES);
	const job = await jobView(user, Number(event.params.id)).catch(rethrowAsHttp);
	const ids = job.joints.flatMap((j) => j.history.logs.map((l) => l.revisionId));
	const body = weldLogCsv(job, await revisionLabels(user.shopId, [...new Set(ids)]));
	const safe = job.number.replace(/[^A-Za-z0-9._-]/g, '_');
	return new Response(body, {
		headers: {
			'Content-Type': 'text/csv; charset=utf-8',
			'Content-Disposition': `attachment; filename="weld-log-${safe}.csv"`,
			'Cache-Control': 'private, no-store'
		}
	});
};
