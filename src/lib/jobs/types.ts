// The shapes of a job and its joints as pages, the API and the data book read them. Shared by
// server and browser (types only).
export type WeldPass = 'root' | 'fill' | 'cap';

export interface LogView {
	id: number;
	pass: WeldPass;
	round: number;
	weldedOn: string;
	welderId: number;
	welderName: string;
	stamp: string;
	revisionId: number;
	overrideId: number | null;
	recordedAt: string;
}

export interface OverrideView {
	id: number;
	welderId: number;
	welderName: string;
	stamp: string;
	refusal: string;
	reason: string;
	printedName: string;
	role: string;
	signedAt: string;
	digest: string;
}

export type JointStatus = 'open' | 'welded' | 'accepted' | 'rejected' | 'repaired';

export interface InspectionView {
	id: number;
	/** The round examined: 0 the first weld, n the n-th repair. */
	round: number;
	method: string;
	extent: string;
	result: 'accept' | 'reject';
	note: string | null;
	printedName: string;
	role: string;
	signedAt: string;
	digest: string;
	/** The NDE report attached when it was signed, downloaded through the job. */
	report: { name: string } | null;
}

export interface RepairView {
	id: number;
	round: number;
	inspectionId: number;
	revisionId: number;
	procedureLabel: string;
	welderName: string;
	stamp: string;
	note: string | null;
	recordedByName: string;
	recordedAt: string;
}

export interface JointHistory {
	round: number;
	status: JointStatus;
	inspections: InspectionView[];
	repairs: RepairView[];
	logs: LogView[];
	overrides: OverrideView[];
}

export interface JointView {
	id: number;
	jobId: number;
	mark: string;
	jointType: string;
	size: string;
	baseMetals: string;
	position: string;
	revisionId: number;
	procedureId: number;
	procedureNumber: string;
	rev: number;
	revisionState: string;
	process: string;
	/** The passes the procedure has (a single-pass procedure: one). */
	passes: WeldPass[];
	/** 0 while first welded; the latest repair's round after a rejection. */
	round: number;
	history: JointHistory;
	/** Where the joint is marked on the job's drawing: fractions (0–1) of its width and height. */
	marker: { x: number; y: number } | null;
}
