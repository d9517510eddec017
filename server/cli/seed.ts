import { env } from '../config/env';
import { migrator } from '../db/migrator';

// The demo accounts have a published password: never in production (as RFOLIO_SEED_DEMO, refused there by env.ts).
if (env().NODE_ENV === 'production') {
  console.error('Refusing to seed the demo group in production: its accounts have a published password.');
  process.exit(1);
}
import { sequelize } from '../db/sequelize';
import { seedDemoOnce } from '../../seeders';

await migrator.up();
const seeded = await seedDemoOnce();
console.log(seeded ? 'Demo data seeded.' : 'Demo data already present: nothing changed.');
await sequelize.close();
