// Who may use each route: one line a route, keyed as the matrix discovers them in src/routes
// (`GET /pattern`, `POST /pattern?/action`, endpoint methods). A new route fails the access
// matrix until its line is added here; a line whose route is gone fails it too.
//
// allow: the roles of the demo shop that get through ('members' = any signed-in member,
// 'public' = anyone, signed in or not). Everyone else is refused: 303 to sign-in or 401 when
// signed out, 403 for a role, 404 for another shop's member on a route naming an object.
// ok: the statuses that mean "it works" for those allowed (default 200 for GET, and for
// actions and other methods anything but a refusal or a 5xx, since the matrix sends them empty).
// skipAllowed: the empty request would end the prober's own session; only refusals are sent.
// Another shop's member on a route naming an object must get 404, or else exactly the answer a
// missing object gets (a route may validate the body first): nothing tells that it exists.
import type { Role } from '../../src/lib/roles';

export interface Access {
	allow: 'public' | 'members' | Role[];
	ok?: number[];
	skipAllowed?: string;
}

const ADMIN: Role[] = ['admin'];
/** Records, procedures, PQRs and welders are read by everyone but the welder. */
const VIEW: Role[] = ['admin', 'engineer', 'inspector'];
/** Records, procedures and PQRs are written by engineers and admins; so are welders' files. */
const AUTHOR: Role[] = ['admin', 'engineer'];
const MANAGE: Role[] = ['admin', 'engineer'];
/** Only an inspector signs or returns a revision; the review queue is the admin's too. */
const REVIEW: Role[] = ['inspector'];
const QUEUE: Role[] = ['inspector', 'admin'];
/** A PQR is certified by an engineer. */
const CERTIFY: Role[] = ['engineer'];

const members = { allow: 'members' } as const;
const pub = (ok?: number[]): Access => ({ allow: 'public', ...(ok ? { ok } : {}) });
const roles = (allow: Role[], ok?: number[]): Access => ({ allow, ...(ok ? { ok } : {}) });

export const ACCESS_RULES: Record<string, Access> = {
	'GET /': { allow: 'members', ok: [303] }, // to the role's start page
	'GET /admin': roles(ADMIN),
	'GET /admin/audit': roles(ADMIN),
	'GET /admin/audit/export.csv': roles(ADMIN),
	'GET /admin/mail': roles(ADMIN),
	'GET /admin/people': roles(ADMIN),
	'GET /admin/people/[id=uuid]': roles(ADMIN),
	'GET /admin/shop': roles(ADMIN),
	'GET /admin/tokens': roles(ADMIN),
	'GET /api/v1/health': pub(),
	'GET /api/v1/jobs': members,
	'GET /api/v1/jobs/[id=id]': members,
	'GET /api/v1/pqrs': roles(VIEW),
	'GET /api/v1/pqrs/[id=id]': roles(VIEW),
	'GET /api/v1/procedures': roles(VIEW),
	'GET /api/v1/procedures/[id=id]': roles(VIEW),
	'GET /api/v1/procedures/[id=id]/revisions/[rev=id]': roles(VIEW),
	'GET /api/v1/settings': roles(VIEW),
	'GET /api/v1/settings/[id=id]': roles(VIEW),
	'GET /api/v1/welders': roles(VIEW),
	'GET /api/v1/welders/[id=id]': roles(VIEW),
	'GET /b/[token]': pub(), // status and number for anyone who scans; values for members
	'GET /booth': members,
	'GET /help/checks': pub(),
	'GET /offline': pub(), // the service worker's "not on this phone" page: names nobody
	'GET /jobs': members, // the welder opens a job to log a weld
	'GET /jobs/[id=id]/weld-log.csv': members,
	'GET /jobs/[id=id]': members,
	'GET /jobs/[id=id]/drawing': members,
	'GET /jobs/[id=id]/inspections/[inspection=id]/report': members,
	'GET /jobs/new': roles(AUTHOR),
	'GET /invite/[token]': pub([404, 410]), // no live invite token can be read back (hashed)
	'GET /pqrs': roles(VIEW),
	'GET /pqrs/[id=id]': roles(VIEW),
	'GET /pqrs/[id=id]/edit': roles(AUTHOR, [200, 303, 409]),
	'GET /pqrs/[id=id]/reports/[report=id]': roles(VIEW),
	'GET /pqrs/new': roles(AUTHOR),
	'GET /procedures': roles(VIEW),
	'GET /procedures/[id=id]': roles(VIEW),
	'GET /procedures/[id=id]/booth-link': roles(ADMIN),
	'GET /procedures/[id=id]/diff': roles(VIEW, [200, 303, 400]), // to the revisions' diff page
	'GET /procedures/[id=id]/sheet': roles(VIEW, [200, 404, 409]),
	'GET /procedures/[id=id]/revisions/[rev=id]': roles(VIEW),
	'GET /procedures/[id=id]/revisions/[rev=id]/diff': roles(VIEW),
	'GET /procedures/[id=id]/revisions/[rev=id]/edit': roles(AUTHOR, [200, 303, 409]),
	'GET /procedures/[id=id]/revisions/[rev=id]/review': roles(QUEUE, [200, 303, 409]),
	'GET /procedures/new': roles(AUTHOR),
	'GET /procedures/numbering': roles(ADMIN),
	'GET /procedures/sheets': roles(VIEW, [200, 400, 404]), // a batch PDF of the ids asked for
	'GET /profile': members,
	'GET /q/[token]': pub(), // a welder's card check: public by design
	'GET /verify/[token]': pub(), // a data book's check against the records: public by design
	'GET /records': roles(VIEW),
	'GET /records/[id=id]': roles(VIEW),
	'GET /records/[id=id]/edit': roles(AUTHOR),
	'GET /records/[id=id]/photos/[photo=id]': members,
	'GET /records/compare': roles(VIEW, [200, 400]),
	'GET /records/export.csv': roles(VIEW),
	'GET /records/new': roles(AUTHOR),
	'GET /records/plot': roles(VIEW),
	'GET /reviews': roles(QUEUE),
	'GET /scan': pub(), // the phone's QR scanner page
	'GET /signin': pub([200, 303]),
	'GET /signin/check-mail': pub(),
	'GET /signout': pub([200, 303, 405]),
	'GET /signup': pub([200, 303]),
	'GET /welders': roles(VIEW),
	'GET /welders/[id=id]': roles(VIEW),
	'GET /welders/[id=id]/card': roles(MANAGE),
	'GET /welders/[id=id]/edit': roles(MANAGE),
	'GET /welders/[id=id]/qualifications/[qid=id]/record': roles(VIEW, [200, 404]), // 404: no PDF
	'GET /welders/[id=id]/qualifications/new': roles(MANAGE),
	'GET /welders/export.csv': roles(VIEW),
	'GET /welders/me': members,
	'GET /welders/me/card': { allow: 'members', ok: [200, 404] }, // 404: not a welder
	'GET /welders/new': roles(MANAGE),
	'PATCH /api/v1/settings/[id=id]': roles(AUTHOR),
	'POST /admin/people?/invite': roles(ADMIN),
	'POST /admin/people?/revokeInvite': roles(ADMIN),
	'POST /admin/people/[id=uuid]?/changeRole': roles(ADMIN),
	'POST /admin/people/[id=uuid]?/disable': roles(ADMIN),
	'POST /admin/people/[id=uuid]?/enable': roles(ADMIN),
	'POST /admin/people/[id=uuid]?/signOutEverywhere': roles(ADMIN),
	'POST /admin/shop?/save': roles(ADMIN),
	'POST /admin/tokens?/create': roles(ADMIN),
	'POST /admin/tokens?/revoke': roles(ADMIN),
	'POST /api/v1/checks': members,
	'POST /api/v1/checks/pqr-ranges': members,
	'POST /api/v1/checks/welder-positions': members,
	'POST /api/v1/booth/[token]/taps': members, // a queued continuity tap; another shop's: refused
	'POST /api/v1/pqrs': roles(AUTHOR),
	'POST /api/v1/pqrs/[id=id]/addenda': roles(AUTHOR),
	'POST /api/v1/pqrs/[id=id]/certify': roles(CERTIFY),
	'POST /api/v1/procedures': roles(AUTHOR),
	'POST /api/v1/procedures/[id=id]/revisions': roles(AUTHOR),
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/approve': roles(REVIEW),
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/return': roles(REVIEW),
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/submit': roles(AUTHOR),
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/withdraw': roles(AUTHOR),
	'POST /api/v1/settings': roles(AUTHOR),
	'POST /api/v1/welders': roles(MANAGE),
	'POST /api/v1/welders/[id=id]/continuity': roles(MANAGE),
	'POST /api/v1/welders/[id=id]/qualifications': roles(MANAGE),
	'POST /b/[token]?/used': members,
	'POST /invite/[token]?/accept': pub([400, 404, 410]),
	'POST /jobs/[id=id]?/addJoint': roles(AUTHOR),
	'POST /jobs/[id=id]?/importJoints': roles(AUTHOR),
	'POST /jobs/[id=id]?/log': roles(['welder']), // only the welder logs their own weld
	'POST /jobs/[id=id]?/override': roles(REVIEW), // an inspector's signed override
	'POST /jobs/[id=id]?/inspect': roles(REVIEW),
	'POST /jobs/[id=id]?/repair': roles(['admin', 'engineer', 'inspector']),
	'POST /jobs/[id=id]?/drawing': roles(AUTHOR),
	'POST /jobs/[id=id]?/mark': roles(AUTHOR),
	'POST /verify/[token]?/copy': pub(), // a copy of the data book checked: public by design
	'POST /jobs/[id=id]/data-book': roles(['admin', 'engineer', 'inspector']), // streams the ZIP
	'POST /jobs/new': roles(AUTHOR),
	'POST /pqrs/[id=id]?/addendum': roles(AUTHOR),
	'POST /pqrs/[id=id]?/certify': roles(CERTIFY),
	'POST /pqrs/[id=id]?/upload': roles(AUTHOR),
	'POST /pqrs/[id=id]/edit?/save': roles(AUTHOR),
	'POST /pqrs/new?/save': roles(AUTHOR),
	'POST /procedures/[id=id]?/newRevision': roles(AUTHOR),
	'POST /procedures/[id=id]/booth-link?/reissue': roles(ADMIN),
	'POST /procedures/[id=id]/booth-link?/revoke': roles(ADMIN),
	'POST /procedures/[id=id]/revisions/[rev=id]?/newRevision': roles(AUTHOR),
	'POST /procedures/[id=id]/revisions/[rev=id]?/submit': roles(AUTHOR),
	'POST /procedures/[id=id]/revisions/[rev=id]?/withdraw': roles(AUTHOR),
	'POST /procedures/[id=id]/revisions/[rev=id]/edit?/save': roles(AUTHOR),
	'POST /procedures/[id=id]/revisions/[rev=id]/review?/approve': roles(REVIEW),
	'POST /procedures/[id=id]/revisions/[rev=id]/review?/return': roles(REVIEW),
	'POST /procedures/new': roles(AUTHOR),
	'POST /procedures/numbering': roles(ADMIN),
	'POST /profile?/password': members,
	'POST /profile?/profile': members,
	'POST /profile?/signOutEverywhere': { allow: 'members', skipAllowed: 'ends the session' },
	'POST /records/[id=id]/edit?/removePhoto': roles(AUTHOR),
	'POST /records/[id=id]/edit?/save': roles(AUTHOR),
	'POST /records/new?/save': roles(AUTHOR),
	'POST /signin?/link': pub(),
	'POST /signin?/password': pub(),
	'POST /signout': pub(),
	'POST /signup?/create': pub(),
	'POST /welders/[id=id]?/addUse': roles(MANAGE),
	'POST /welders/[id=id]?/confirm': roles(MANAGE),
	'POST /welders/[id=id]?/revokeLink': roles(MANAGE),
	'POST /welders/[id=id]?/withdraw': roles(MANAGE),
	'POST /welders/[id=id]/edit': roles(MANAGE),
	'POST /welders/[id=id]/qualifications/new': roles(MANAGE),
	'POST /welders/me?/tap': members,
	'POST /welders/new': roles(MANAGE),
	'PUT /api/v1/pqrs/[id=id]': roles(AUTHOR),
	'PUT /api/v1/procedures/[id=id]/revisions/[rev=id]': roles(AUTHOR)
};
