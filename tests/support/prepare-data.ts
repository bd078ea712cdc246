// Run by own-server.ts in a child process with the data folder's environment set: migrations
// and the demo shops, as the end-to-end server gets them.
import { prepareDatabase } from '../../scripts/lib/local-stack';

await prepareDatabase({ seed: true });
