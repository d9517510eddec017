import { migrator } from '../db/migrator';
import { sequelize } from '../db/sequelize';
import { seedDemoOnce } from '../../seeders';

await migrator.up();
const seeded = await seedDemoOnce();
console.log(seeded ? 'Demo data seeded.' : 'Demo data already present: nothing changed.');
await sequelize.close();
