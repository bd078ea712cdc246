// npm run db:migrate — brings the database of DATABASE_URL (or DATABASE_FILE) up to date.
import { exitOnConfigError, migrate, sequelize } from '../src/lib/server/db';

const applied = await migrate().catch(exitOnConfigError);
console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'Schema is up to date.');
await sequelize.close();
