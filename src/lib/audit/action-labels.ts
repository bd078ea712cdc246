// Every audit event code the app writes, in the shop's words: a short label (filters, headings)
// and what the person did, to follow their name in a sentence. action-labels.test.ts reads the
// server's source for every code it writes and fails on one missing here.

export interface ActionWords {
	/** "Revision approved" */
	label: string;
	/** "approved and signed the revision", after the person's name */
	did: string;
	/** An edit: the sentence names what changed ("changed amperage, low end: …"). */
	edit?: true;
}

const a = (label: string, did: string): ActionWords => ({ label, did });
const edit = (label: string, did: string): ActionWords => ({ label, did, edit: true });

export const ACTION_WORDS: Readonly<Record<string, ActionWords>> = {
	// procedures and their revisions
	'procedure.created': a('Procedure created', 'created the procedure'),
	'procedure_numbering.updated': edit('Numbering changed', 'changed the procedure numbering'),
	'procedure_revision.created': a('Revision started', 'started a new revision as a draft'),
	'procedure_revision.updated': edit('Draft edited', 'saved the draft'),
	'procedure_revision.submitted': a('Sent for review', 'sent the revision for review'),
	'procedure_revision.returned': a('Returned with comments', 'returned the revision with comments'),
	'procedure_revision.approved': a('Revision approved', 'approved and signed the revision'),
	'procedure_revision.superseded': a(
		'Revision superseded',
		'superseded the revision by approving a newer one'
	),
	'procedure_revision.withdrawn': a('Revision withdrawn', 'withdrew the revision'),
	'procedure_revision.signature_refused': a(
		'Signature refused',
		'tried to sign, and the password was refused'
	),
	'procedure_revision.tamper_detected': a(
		'Signature mismatch found',
		'opened the revision and found it no longer matches what was signed'
	),
	'procedure_sheet.downloaded': a('Sheet downloaded', 'downloaded the procedure sheet'),
	'procedure_sheet.batch_downloaded': a(
		'Sheets downloaded',
		'downloaded a batch of procedure sheets'
	),
	'booth_link.revoked': a('Booth link withdrawn', 'withdrew the booth link'),
	'booth_link.reissued': a('Booth link reissued', 'withdrew the booth link and issued a new one'),
	// settings records
	'settings_record.created': a('Settings recorded', 'recorded the settings'),
	'settings_record.updated': edit('Settings record edited', 'edited the settings record'),
	'settings_record.frozen': a(
		'Record frozen',
		'cited the settings record in a procedure, which froze it'
	),
	'settings_photo.removed': a('Photo removed', 'removed a photo from the settings record'),
	// PQRs
	'pqr.created': a('PQR created', 'created the PQR'),
	'pqr.updated': edit('PQR edited', 'edited the PQR'),
	'pqr.certified': a('PQR certified', 'certified the PQR'),
	'pqr.addendum_added': a('Addendum added', 'added an addendum to the PQR'),
	'pqr.tamper_detected': a(
		'PQR mismatch found',
		'opened the PQR and found it no longer matches what was certified'
	),
	'pqr_report.uploaded': a('Lab report attached', 'attached a lab report'),
	'pqr_report.downloaded': a('Lab report opened', 'opened a lab report'),
	'pqr_report.tamper_detected': a(
		'Lab report mismatch found',
		'opened a lab report whose file no longer matches the one attached'
	),
	// welders, qualifications, continuity
	'welder.created': a('Welder added', 'added the welder'),
	'welder.updated': edit('Welder edited', 'edited the welder'),
	'qualification.created': a('Qualification recorded', 'recorded a qualification'),
	'qualification.confirmed': a('Qualification confirmed', 'confirmed the qualification'),
	'qualification.withdrawn': a('Qualification withdrawn', 'withdrew the qualification'),
	'continuity.recorded': a('Process use logged', 'logged a use of the process for continuity'),
	'continuity.refused': a('Booth tap refused', 'tapped at the booth, and the tap was refused'),
	'verification-link.issued': a('Card check link issued', 'issued a card check link'),
	'verification-link.revoked': a('Card check links withdrawn', 'withdrew the card check links'),
	// people, the shop and API tokens
	'shop.created': a('Shop created', 'created the shop'),
	'shop.settings_updated': edit('Shop settings changed', 'changed the shop settings'),
	'user.created': a('Member joined', 'joined the shop'),
	'user.profile_updated': edit('Profile changed', 'changed their profile'),
	'user.password_changed': a('Password changed', 'changed their password'),
	'user.role_changed': edit('Role changed', 'changed the member’s role'),
	'user.disabled': a('Member disabled', 'disabled the member'),
	'user.enabled': a('Member enabled', 'enabled the member again'),
	'user.signed_out_everywhere': a('Signed out everywhere', 'signed the member out everywhere'),
	'invite.created': a('Invite sent', 'sent an invite'),
	'invite.revoked': a('Invite withdrawn', 'withdrew an invite'),
	'invite.accepted': a('Invite accepted', 'accepted the invite'),
	'api-token.created': a('API token created', 'created an API token'),
	'api-token.revoked': a('API token withdrawn', 'withdrew an API token'),
	// jobs, joints, the weld log and inspections (issue #17)
	'job.created': a('Job opened', 'opened the job'),
	'job.joint_added': a('Joint added', 'added a joint to the job'),
	'job.joints_imported': a('Joint list added', 'added the joints of a pasted list to the job'),
	'job.signature_refused': a('Signature refused', 'tried to sign with a wrong password'),
	'weld.logged': a('Weld logged', 'logged passes welded on the joint'),
	'weld.override_signed': a('Override signed', 'signed an override for a refused weld log'),
	'joint.inspected': a('Joint inspected', 'inspected the joint and signed the result'),
	'joint.repair_opened': a('Repair opened', 'opened a repair of the rejected joint'),
	'joint.report_downloaded': a('Inspection report downloaded', 'downloaded an inspection report'),
	'joint.report_tamper_detected': a(
		'Inspection report altered',
		'asked for an inspection report whose stored bytes no longer match their digest'
	),
	'job.drawing_attached': a('Drawing attached', 'attached the drawing to the job'),
	'joint.marker_placed': a(
		'Joint marked on the drawing',
		'marked where the joint is on the drawing'
	),
	'data-book.compiled': a('Data book compiled', 'compiled the job’s data book for the customer')
};

/** The words for a code; one no table knows reads from its own words ("pqr.reopened" → …). */
export function actionWords(code: string): ActionWords {
	if (Object.hasOwn(ACTION_WORDS, code)) return ACTION_WORDS[code]!;
	const [thing = '', verb = ''] = code.split('.');
	const words = (s: string) => s.replace(/[_-]+/g, ' ').trim();
	const label = `${words(thing)} ${words(verb)}`.trim() || 'Event';
	return { label: label[0]!.toUpperCase() + label.slice(1), did: `recorded “${label}”` };
}

/** What an audit entry's object is, in words ("procedure_revision" → "procedure revision"). */
export const OBJECT_WORDS: Readonly<Record<string, string>> = {
	procedure: 'Procedure',
	procedure_revision: 'Procedure revision',
	procedure_sheets: 'Procedure sheets',
	settings_record: 'Settings record',
	pqr: 'PQR',
	welder: 'Welder',
	qualification: 'Qualification',
	'booth-link': 'Booth link',
	shop: 'Shop',
	user: 'Member',
	invite: 'Invite',
	'api-token': 'API token'
};

export function objectWords(type: string): string {
	if (Object.hasOwn(OBJECT_WORDS, type)) return OBJECT_WORDS[type]!;
	const s = type.replace(/[_-]+/g, ' ').trim();
	return s ? s[0]!.toUpperCase() + s.slice(1) : 'Object';
}
