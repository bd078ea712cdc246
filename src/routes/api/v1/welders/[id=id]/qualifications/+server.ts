import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { apiRefusal } from '$lib/server/welders/api';
import { MANAGE_ROLES } from '$lib/server/welders/access';
import { addQualification } from '$lib/server/welders/qualifications';
import { qualificationSchema } from '$lib/schemas/welder';

/** Records a qualification test (the same fields as the form; lengths as text, e.g. "3/8"). */
export const POST = api(async (event) => {
	const user = await apiMember(event, ...MANAGE_ROLES);
	const body = await readBody(event, qualificationSchema);
	const q = await addQualification(user, Number(event.params.id), body, null, event).catch(
		apiRefusal
	);
	return json({ id: q.id }, { status: 201 });
});
