import { createServer } from 'node:net';

/** A port nothing listens on right now (the OS picks it), for a server the bench starts. */
export function freePort(): Promise<number> {
	return new Promise((resolve) => {
		const s = createServer().listen(0, '127.0.0.1', () => {
			const { port } = s.address() as { port: number };
			s.close(() => resolve(port));
		});
	});
}
