// Demo data: an invented research group with invented records. Seeded once, in demo mode only.
import { sequelize } from '../server/db/sequelize';
import { env } from '../server/config/env';
import { seedDemoUsers, demoAccounts } from './demo-users';
import { seedDemoPeople } from './demo-people';
import { seedDemoRecords } from './demo-records';
import { seedDemoStructureDuplicate } from './demo-curation';

export { demoAccounts };

const MARKER = 'demo_seeded';

/** Seeds the demo on the first run only; later starts find the marker and keep every row as it is. */
export async function seedDemoOnce(): Promise<boolean> {
  const [rows] = await sequelize.query('SELECT 1 FROM app_meta WHERE key = :key', { replacements: { key: MARKER } });
  if (rows.length > 0) return false;
  await sequelize.transaction(async (transaction) => {
    await seedDemoUsers(env().RFOLIO_DEMO_PASSWORD, transaction);
    await seedDemoRecords(await seedDemoPeople(env().RFOLIO_DEMO_PASSWORD, transaction), transaction);
    await seedDemoStructureDuplicate(transaction);
    await sequelize.query(`INSERT INTO app_meta (key, value) VALUES (:key, :value::jsonb)`, {
      replacements: { key: MARKER, value: JSON.stringify({ at: new Date().toISOString() }) },
      transaction,
    });
  });
  // Planner statistics for the freshly loaded tables now, rather than when autovacuum's analyze gets round to them.
  await sequelize.query('ANALYZE');
  return true;
}
