// Uploads on the shared end-to-end server (the local folder): the hostile-upload checks of
// tests/support/hostile-uploads-suite.ts against the record photo and PQR lab report uploads.
import { join } from 'node:path';
import { listFiles } from '../scripts/lib/backup';
import { hostileUploadTests } from './support/hostile-uploads-suite';
import { cookieOf, origin, withE2eDatabase } from './support/http';

hostileUploadTests({
	origin,
	cookieOf,
	withDatabase: withE2eDatabase,
	storedNames: () => listFiles(join(process.env.E2E_DATA_DIR ?? '', 'uploads'))
});
