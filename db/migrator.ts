import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { appAccountFromEnv } from './connection';
import { MIGRATIONS } from './migrations';
import type { MigrationContext } from './migrations/context';

/** Umzug over our explicit migration list; applied names are kept in the `schema_migrations` table. */
export function createMigrator(
  sequelize: Sequelize,
  log: (message: string) => void = () => undefined,
) {
  const context: MigrationContext = {
    sequelize,
    queryInterface: sequelize.getQueryInterface(),
    appAccount: appAccountFromEnv(),
  };
  return new Umzug<MigrationContext>({
    migrations: MIGRATIONS.map((migration) => ({
      name: migration.name,
      up: ({ context: ctx }) => migration.up(ctx),
      down: ({ context: ctx }) => migration.down(ctx),
    })),
    context,
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: {
      info: (event) => {
        const record = event as { event?: string; name?: string };
        if (record.event === 'migrated') log(`migrated ${record.name}`);
      },
      warn: (event) => log(`warning: ${JSON.stringify(event)}`),
      error: (event) => log(`error: ${JSON.stringify(event)}`),
      debug: () => undefined,
    },
  });
}
