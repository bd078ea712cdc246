// npm run db:seed — adds the invented demo shops (idempotent).
import { migrate, sequelize } from '../src/lib/server/db';
import { seedDemo } from '../src/lib/server/seed/seed-demo';

await migrate();
const { shop, other } = await seedDemo();
console.log(`Seeded ${shop.name} and ${other.name}.`);
await sequelize.close();
