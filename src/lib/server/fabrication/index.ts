// Jobs, joints and their weld log (issue #17): the services every page and endpoint calls.
export * from './access';
export { createJob, findJob, listJobs } from './jobs';
export { addJoint, importJoints, JointListError } from './joints';
export { CSV_EXAMPLE, parseJointCsv, type RowProblem } from './joint-csv';
export { jobView, jointsOf, type JobView } from './read';
export type { JointView } from '$lib/jobs/types';
export { jobList, type JobRow } from './list';
export { findJoint, logWeld, NOT_A_WELDER, type LoggedWeld } from './weld-log';
export { checkWeld, type WeldCheck } from './weld-check';
export { recordOverride } from './override';
export { signatureHolds } from './signing';
export { recordInspection, recordRepair } from './inspection';
export { attachDrawing, openDrawing, openInspectionReport, placeMarker } from './drawing';
export { fileResponse, MAX_JOB_FILE_BYTES } from './files';
