import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-seed-jobs-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { migrate } = await import('../db');
const { seedDemo } = await import('./seed-demo');
const { DEMO_JOB, seedJobs } = await import('./seed-jobs');
const { Job, JobJoint } = await import('../models');
const { jobView } = await import('../fabrication');

describe('demo job', () => {
	it(
		'lists its joints against procedures in force, and seeding again changes nothing',
		{ timeout: 120_000 },
		async () => {
			await migrate();
			const { shop } = await seedDemo();
			const job = await Job.findOne({ where: { shopId: shop.id, number: DEMO_JOB } });
			expect(job).not.toBeNull();
			const view = await jobView({ shopId: shop.id }, job!.id);
			expect(view.joints.map((j) => j.mark)).toEqual(['W1', 'W2', 'W3', 'W4', 'W5', 'W6']);
			expect(view.joints.every((j) => j.revisionState === 'approved')).toBe(true);
			// Half done: W1 accepted, W2 and W3 welded, W4 to W6 open.
			expect(view.joints.map((j) => j.history.status)).toEqual([
				'accepted',
				'welded',
				'welded',
				'open',
				'open',
				'open'
			]);
			expect(await seedJobs(shop)).toBeNull();
			expect(await JobJoint.count({ where: { jobId: job!.id } })).toBe(6);
		}
	);
});
