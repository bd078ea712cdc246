// npm run db:migrate — brings the database at DATABASE_FILE up to date.
import { migrate, sequelize } from '../src/lib/server/db';

const applied = await migrate();
console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'Schema is up to date.');
await sequelize.close();
