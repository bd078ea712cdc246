// One-off Lighthouse check of the booth view (not committed).
import { audit } from '../../scripts/bench/lighthouse';
import { signInCookie } from '../../scripts/bench/http';
import { ownServer } from './own-server';
import { boothTokenOn } from './offline';

const server = await ownServer();
await server.start();
try {
	const token = await boothTokenOn(server, 'WPS-001', 2);
	const cookie = await signInCookie(server.origin, 'tomas@larkspur.example', (await import('./people')).welder.password);
	const r = await audit(server.origin, [
		{ name: 'booth signed out', path: `/b/${token}` },
		{ name: 'booth welder', path: `/b/${token}`, cookie }
	], 9333);
	console.log(JSON.stringify(r, null, 1));
} finally {
	await server.dispose();
}
