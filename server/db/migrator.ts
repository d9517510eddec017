import { Umzug, SequelizeStorage } from 'umzug';
import { pathToFileURL, fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';
import type { QueryInterface } from 'sequelize';
import { sequelize } from './sequelize';

const here = dirname(fileURLToPath(import.meta.url));

export type Migration = (ctx: { context: QueryInterface }) => Promise<void>;

/**
 * Migrations are server/db/migrations/<yyyymmddhhmm>-<name>.ts exporting `up` and `down`.
 * Loaded through dynamic import so they run under tsx and Vitest alike.
 */
export const migrator = new Umzug({
  migrations: {
    glob: ['migrations/*.ts', { cwd: here }],
    resolve: ({ name, path }) => {
      const load = async () => import(pathToFileURL(path ?? join(here, 'migrations', name)).href);
      return {
        name,
        up: async ({ context }) => (await load()).up({ context }),
        down: async ({ context }) => (await load()).down({ context }),
      };
    },
  },
  context: sequelize.getQueryInterface(),
  storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
  logger: undefined,
});
