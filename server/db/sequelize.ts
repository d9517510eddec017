import { Sequelize } from 'sequelize';
import { env } from '../config/env';

/** One Sequelize instance per process; the pool is sized for a 2-core app server. */
export const sequelize = new Sequelize(env().DATABASE_URL, {
  dialect: 'postgres',
  logging: false,
  pool: { max: 20, min: 0, idle: 10_000, acquire: 10_000 },
  dialectOptions: { connectionTimeoutMillis: 3_000, statement_timeout: 30_000 },
  define: { underscored: true },
});

/** True when PostgreSQL answers within the timeout. */
export async function databaseIsUp(timeoutMs = 2_000): Promise<boolean> {
  try {
    await Promise.race([
      sequelize.query('SELECT 1'),
      new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), timeoutMs)),
    ]);
    return true;
  } catch {
    return false;
  }
}
