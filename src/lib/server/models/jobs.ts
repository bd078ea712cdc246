// The job models (issue #17), kept apart from index.ts so parallel features add one line there
// each. Import models from './index' (or '$lib/server/models'), not from here.
import { hasManyAs } from './associate';
import { JointInspection, JointRepair } from './inspection';
import { Job, JobJoint } from './job';
import { WeldLog, WeldOverride } from './weld-log';

Job.hasMany(JobJoint, { foreignKey: 'jobId', as: 'joints' });
JobJoint.belongsTo(Job, { foreignKey: 'jobId' });
hasManyAs(JobJoint, 'jointId', {
	logs: WeldLog,
	overrides: WeldOverride,
	inspections: JointInspection,
	repairs: JointRepair
});

export { Job, JobJoint, JointInspection, JointRepair, WeldLog, WeldOverride };
