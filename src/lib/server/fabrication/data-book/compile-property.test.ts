// A property over whole compiled data books: whatever a job holds (how many joints, which passes
// logged, which joints inspected and how), the ZIP read back with yauzl always matches its
// manifest file for file, the manifest counts what was recorded, and the public check says it
// matches until something moves.
import fc from 'fast-check';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { readAll, unzip } from '$lib/test-support/unzip';

const dir = mkdtempSync(join(tmpdir(), 'beadline-data-book-prop-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const P = await import('../../procedures/test-support');
const svc = await import('../index');
const T = await import('../test-support');
const { compileDataBook } = await import('./compile');
const { checkFiles, MANIFEST_NAME, parseManifest, sha256Hex } = await import('./manifest');
const { checkDataBook } = await import('./verify');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let wps: { id: number; number: string };

beforeAll(async () => {
	a = await P.shopWithPeople('Data Book Property Shop');
	wps = await T.approvedProcedure(a);
	await T.linkedWelder(a, a.welder, {}, 'DBP-01');
});

const PASSES = [[], ['root'], ['root', 'fill'], ['root', 'fill', 'cap']] as const;
const jointArb = fc.record({
	passes: fc.constantFrom(...PASSES),
	inspection: fc.constantFrom(null, 'accept', 'reject')
});

describe('a compiled data book', () => {
	it('always matches its files, counts what was recorded, and verifies', async () => {
		await fc.assert(
			fc.asyncProperty(fc.array(jointArb, { minLength: 0, maxLength: 3 }), async (plan) => {
				const { id: jobId } = await T.newJob(a);
				if (plan.length)
					await svc.importJoints(
						a.engineer,
						jobId,
						`mark,type,position,procedure\n${plan.map((_, i) => `W${i + 1},tee,2F,${wps.number}`).join('\n')}\n`
					);
				const joints = (await svc.jobView(a.engineer, jobId)).joints;
				let welds = 0;
				let inspections = 0;
				for (const [i, step] of plan.entries()) {
					const joint = joints[i]!;
					if (!step.passes.length) continue;
					await svc.logWeld(a.welder, { jointId: joint.id, passes: [...step.passes] });
					welds += step.passes.length;
					if (!step.inspection) continue;
					await svc.recordInspection(a.inspector, {
						jointId: joint.id,
						method: 'VT',
						extent: '100 %',
						result: step.inspection,
						note: '',
						password: P.PASSWORD
					});
					inspections++;
				}
				const book = await compileDataBook(a.engineer, jobId);
				const files = await unzip(await readAll(book.zip()));
				const manifest = parseManifest(files.get(MANIFEST_NAME)!.toString('utf8'))!;
				const found = new Map(
					[...files].map(([n, b]) => [n, { sha256: sha256Hex(b), bytes: b.length }])
				);
				expect(checkFiles(manifest, found)).toEqual([]);
				expect(manifest.files.filter((f) => f.kind === 'weld-log')).toHaveLength(1);
				expect(manifest.records.counts).toMatchObject({
					joints: plan.length,
					welds,
					inspections,
					procedures: plan.length ? 1 : 0,
					welders: welds ? 1 : 0
				});
				expect(sha256Hex(files.get(MANIFEST_NAME)!)).toBe(book.manifestDigest);
				expect((await checkDataBook(book.token))?.matches).toBe(true);
			}),
			{ numRuns: 6 }
		);
	});
});
