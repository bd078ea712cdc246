// How a built server process is started, in one place: the demo, the end-to-end server and the
// bench use these Node flags, and package.json's `start` spells the same ones (keep them equal),
// so what the bench measures is what runs.
//
// Why the flags (npm run bench:memory, 10,000 mixed requests on the bench's 100k-record data):
// the live heap after the requests is about 37 MB, but with Node's defaults on this 24 GB machine
// (heap limit 4.3 GB, 16 MB semi-spaces) V8 let the old space grow to ~150 MB and the new space
// to 32 MB before collecting, and the server sat at 266-282 MB resident. A 512 MB old-space limit
// (13x the live heap; V8 sizes its first collection thresholds from the limit) and 4 MB
// semi-spaces bring it to 140 MB (peak 145). 256 MB measured the same, so the higher, safer cap.
// MALLOC_ARENA_MAX=2 measured within the noise (262 MB) and is not set.
export const SERVER_NODE_FLAGS = ['--max-old-space-size=512', '--max-semi-space-size=4'];

/** Node's arguments for the built server at `index` (build/index.js). */
export function serverArgs(index: string): string[] {
	return [...SERVER_NODE_FLAGS, index];
}
