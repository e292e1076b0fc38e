import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug, type MigrationFn as UmzugMigrationFn } from 'umzug';

export type MigrationFn = UmzugMigrationFn<QueryInterface>;

const MIGRATIONS_DIR = path.resolve(process.cwd(), 'migrations');

/**
 * The umzug migrator over migrations/*.ts. Files are imported by file URL so that
 * the same code runs under tsx and inside vitest's transform.
 */
export function createMigrator(sequelize: Sequelize): Umzug<QueryInterface> {
  return new Umzug({
    migrations: {
      glob: ['*.ts', { cwd: MIGRATIONS_DIR }],
      resolve: ({ name, path: filePath }) => {
        if (!filePath) throw new Error(`migration ${name} has no path`);
        const load = () => import(pathToFileURL(filePath).href) as Promise<{ up: MigrationFn; down: MigrationFn }>;
        return {
          name,
          up: async (params) => (await load()).up(params),
          down: async (params) => (await load()).down(params),
        };
      },
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}
