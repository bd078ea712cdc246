// The job models (issue #17), kept apart from index.ts so parallel features add one line there
// each. Import models from './index' (or '$lib/server/models'), not from here.
import { JointInspection, JointRepair } from './inspection';
import { Job, JobJoint } from './job';
import { WeldLog, WeldOverride } from './weld-log';

Job.hasMany(JobJoint, { foreignKey: 'jobId', as: 'joints' });
JobJoint.belongsTo(Job, { foreignKey: 'jobId' });
JobJoint.hasMany(WeldLog, { foreignKey: 'jointId', as: 'logs' });
JobJoint.hasMany(WeldOverride, { foreignKey: 'jointId', as: 'overrides' });

JobJoint.hasMany(JointInspection, { foreignKey: 'jointId', as: 'inspections' });
JobJoint.hasMany(JointRepair, { foreignKey: 'jointId', as: 'repairs' });

export { Job, JobJoint, JointInspection, JointRepair, WeldLog, WeldOverride };
