// The one table of what an audit entry's field paths mean to the shop: a label and how the value
// reads ("variables.electrical.amps.min" is "Amperage, low end", a current in amps). The
// procedure variables come from the editor's own field table (RANGE_FIELDS / SINGLE_FIELDS), so a
// quantity is named and converted the same way in the form and in the trail. Pure.
import { RANGE_FIELDS, SINGLE_FIELDS } from '$lib/procedures/fields';
import {
	BEAD_LABELS,
	CODE_LABELS,
	PASS_LABELS,
	PQR_STATE_LABELS,
	STATE_LABELS
} from '$lib/procedures/options';
import type { QuantityKind } from '$lib/procedures/quantities';
import {
	FAMILY_LABELS,
	JOINT_LABELS,
	OUTCOME_LABELS,
	PROCESS_LABELS,
	TRANSFER_LABELS
} from '$lib/records/options';

/** How a leaf value reads: a quantity in the reader's units, a choice by its label, or as is. */
export type ValueKind =
	| { quantity: QuantityKind }
	| { choices: Readonly<Record<string, string>> }
	| 'day'
	| 'bytes'
	| 'text';

export interface FieldSpec {
	label: string;
	value: ValueKind;
	/** An internal row number: kept in the raw entry, left out of the words. */
	internal?: true;
}

const q = (label: string, quantity: QuantityKind): FieldSpec => ({ label, value: { quantity } });
const c = (label: string, choices: Readonly<Record<string, string>>): FieldSpec => ({
	label,
	value: { choices }
});
const t = (label: string): FieldSpec => ({ label, value: 'text' });

const id = (label: string): FieldSpec => ({ label, value: 'text', internal: true });
/** A revision's or a PQR's state: both kinds of object have a `state`. */
const STATES = { ...STATE_LABELS, ...PQR_STATE_LABELS };
const UNIT_SYSTEMS = { imperial: 'Imperial', metric: 'Metric' };
const DECISIONS = { approved: 'Approved', returned: 'Returned with comments' };

/** The revision's variables document, by "<group>.<key>" under `variables.`. */
const VARIABLES: Record<string, FieldSpec> = {
	v: t('Document version'),
	title: t('Title'),
	code: c('Code', CODE_LABELS),
	codeEdition: t('Code edition'),
	scope: t('Scope'),
	process: c('Process', PROCESS_LABELS),
	'electrical.currentType': t('Current and polarity'),
	'electrical.transfer': c('Transfer mode', TRANSFER_LABELS),
	'electrical.tungstenClass': t('Tungsten'),
	'joints.types': c('Joint types', JOINT_LABELS),
	'joints.design': t('Joint design'),
	'joints.backing': t('Backing'),
	'baseMetals.specs': t('Base metal specifications'),
	'baseMetals.family': c('Material', FAMILY_LABELS),
	'baseMetals.pNumbers': t('P-Numbers'),
	'fillerMetals.classifications': t('Filler classifications'),
	'fillerMetals.fNumbers': t('F-Numbers'),
	'fillerMetals.aNumbers': t('A-Numbers'),
	'positions.allowed': t('Positions'),
	'positions.progression': t('Vertical progression'),
	'pwht.required': t('PWHT required'),
	'pwht.notes': t('PWHT notes'),
	'gas.shielding': t('Shielding gas'),
	'gas.backing': t('Backing gas'),
	'technique.bead': c('Bead', BEAD_LABELS),
	'technique.passes': c('Passes', PASS_LABELS),
	'technique.cleaning': t('Cleaning'),
	'technique.notes': t('Technique notes')
};
for (const f of [...Object.values(RANGE_FIELDS), ...Object.values(SINGLE_FIELDS)])
	VARIABLES[`${f.group}.${f.key}`] = q(f.label, f.kind);

/** Everything else by its last name: settings record columns and the other events' fields. */
const FIELDS: Record<string, FieldSpec> = {
	// settings records (their columns, as the record's events snapshot them)
	process: c('Process', PROCESS_LABELS),
	currentType: t('Current and polarity'),
	transfer: c('Transfer mode', TRANSFER_LABELS),
	amps: q('Amperage', 'amps'),
	volts: q('Voltage', 'volts'),
	wireFeedMmPerS: q('Wire feed speed', 'wire'),
	travelSpeedMmPerS: q('Travel speed', 'travel'),
	fillerClass: t('Filler classification'),
	fillerDiameterMm: q('Filler diameter', 'diameter'),
	tungstenClass: t('Tungsten'),
	tungstenDiameterMm: q('Tungsten diameter', 'diameter'),
	gasName: t('Shielding gas'),
	gasFlowLPerMin: q('Shielding gas flow', 'flow'),
	baseMetalSpec: t('Base metal specification'),
	baseMetalFamily: c('Material', FAMILY_LABELS),
	pNumber: t('P-Number'),
	thicknessMm: q('Base metal thickness', 'thickness'),
	jointType: c('Joint type', JOINT_LABELS),
	position: t('Position'),
	preheatC: q('Preheat', 'temperature'),
	interpassC: q('Interpass temperature', 'temperature'),
	machine: t('Machine'),
	jobRef: t('Job'),
	outcome: t('Outcome'),
	outcomeKind: c('Outcome kind', OUTCOME_LABELS),
	defects: t('Defects'),
	notes: t('Notes'),
	weldedOn: { label: 'Welded on', value: 'day' },
	cautionCount: t('Cautions'),
	photos: t('Photos'),
	photosAdded: t('Photos added'),
	photo: t('Photo'),
	frozen: t('Frozen'),
	citedBy: t('Cited by procedure'),
	// procedures, revisions, sign-offs, sheets and booth links
	state: c('State', STATES),
	rev: t('Revision'),
	copiedFrom: t('Copied from revision'),
	supersededByRev: t('Superseded by revision'),
	submittedAt: t('Submitted'),
	withdrawnAt: t('Withdrawn'),
	reason: t('Reason'),
	comment: t('Comment'),
	meaning: c('Decision', DECISIONS),
	printedName: t('Signed as'),
	role: t('Role'),
	signedAt: t('Signed'),
	signOffId: id('Sign-off number'),
	digest: t('Signature digest'),
	problems: t('Problems found'),
	seenIn: t('Seen in'),
	procedureId: id('Procedure number (internal)'),
	pqrIds: id('PQRs cited (internal numbers)'),
	recordIds: t('Settings records cited'),
	fromRecords: t('Drafted from settings records'),
	number: t('Number'),
	code: c('Code', CODE_LABELS),
	paper: t('Paper'),
	intact: t('Matches its signature'),
	sheets: t('Sheets'),
	revisions: t('Revisions'),
	revisionId: id('Revision (internal number)'),
	revisionIds: id('Revisions (internal numbers)'),
	notIntact: t('Not matching their signature'),
	liveLinks: t('Live booth links'),
	// PQRs and lab reports
	certifiedBy: t('Certified by'),
	certifiedAt: t('Certified'),
	addendumId: id('Addendum number'),
	body: t('Text'),
	reportId: id('Report number'),
	bytes: { label: 'Size', value: 'bytes' },
	sha256: t('SHA-256'),
	found: t('SHA-256 found'),
	// people, shop, tokens, invites
	name: t('Name'),
	email: t('E-mail'),
	via: t('Joined by'),
	unitSystem: c('Units', UNIT_SYSTEMS),
	defaultCode: c('Default code', CODE_LABELS),
	timeZone: t('Time zone'),
	active: t('Active'),
	sessionVersion: t('Session version'),
	expiresAt: t('Expires'),
	replacedPending: t('Replaced a pending invite'),
	usedAt: t('Accepted'),
	userId: id('Member'),
	revokedAt: t('Withdrawn'),
	prefix: t('Token prefix'),
	revoked: t('Links withdrawn'),
	// welders, qualifications, continuity
	welderId: id('Welder (internal number)'),
	usedOn: { label: 'Used on', value: 'day' },
	source: t('Recorded from'),
	note: t('Note'),
	confirmedOn: { label: 'Confirmed on', value: 'day' },
	responsiblePerson: t('Responsible person'),
	record: t('Test record file'),
	madeAt: t('Tapped'),
	receivedAt: t('Received'),
	message: t('Message')
};

const ENDS: Record<string, string> = { min: 'low end', max: 'high end' };

/** "thicknessMm" → "thickness mm", "signOffId" → "sign off id": a readable last resort. */
export function humanize(name: string): string {
	const words = name
		.replace(/([a-z0-9])([A-Z])/g, '$1 $2')
		.replace(/[_-]+/g, ' ')
		.trim()
		.toLowerCase();
	return words ? words[0]!.toUpperCase() + words.slice(1) : 'Value';
}

/**
 * What a dotted path names. `variables.<group>.<key>[.min|.max]` is looked up in the variables,
 * anything else by its last name (a range end by the name before it); a path no table knows
 * gets a label made from its own words, so nothing shows as a raw path.
 */
export function fieldOf(path: string): FieldSpec {
	const parts = path.split('.').filter(Boolean);
	const end = ENDS[parts[parts.length - 1] ?? ''];
	if (end) parts.pop();
	const inVariables = parts[0] === 'variables' ? parts.slice(1).join('.') : null;
	const last = parts[parts.length - 1] ?? path;
	const known =
		(inVariables !== null && Object.hasOwn(VARIABLES, inVariables)
			? VARIABLES[inVariables]
			: undefined) ?? (Object.hasOwn(FIELDS, last) ? FIELDS[last] : undefined);
	// An array's items ("printed.0.number") read as the item's field with its place.
	const index = parts.find((p) => /^\d+$/.test(p));
	const base = known ?? t(humanize(/^\d+$/.test(last) ? (parts[parts.length - 2] ?? last) : last));
	const label = [base.label, index !== undefined && known ? `item ${Number(index) + 1}` : null, end]
		.filter(Boolean)
		.join(', ');
	return { ...base, label };
}

/** A label inside a sentence: "Amperage" → "amperage", but "PWHT" and "P-Numbers" stay. */
export function inSentence(label: string): string {
	return /^[A-Z][a-z]/.test(label) ? label[0]!.toLowerCase() + label.slice(1) : label;
}
