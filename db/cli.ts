import { connectAsOwner } from './connection';
import { createMigrator } from './migrator';
import { seedDemo } from './seeders/seed-demo';

/** `tsx db/cli.ts migrate|seed|status|down` against DATABASE_MIGRATION_URL (or DATABASE_URL). */
async function main(command: string | undefined): Promise<void> {
  const sequelize = connectAsOwner();
  const log = (message: string) => process.stdout.write(`[db] ${message}\n`);
  try {
    const migrator = createMigrator(sequelize, log);
    switch (command) {
      case 'migrate': {
        const applied = await migrator.up();
        log(applied.length ? `${applied.length} migration(s) applied` : 'schema is up to date');
        break;
      }
      case 'down': {
        const reverted = await migrator.down();
        log(`reverted ${reverted.map((m) => m.name).join(', ') || 'nothing'}`);
        break;
      }
      case 'status': {
        const pending = await migrator.pending();
        const executed = await migrator.executed();
        log(
          `applied ${executed.length}, pending ${pending.length}${pending.length ? `: ${pending.map((m) => m.name).join(', ')}` : ''}`,
        );
        break;
      }
      case 'seed': {
        const outcome = await seedDemo(sequelize);
        log(
          outcome.parts.length
            ? `demo data loaded: ${outcome.parts.join('; ')}`
            : 'database already has its data: demo seed skipped',
        );
        break;
      }
      default:
        throw new Error(`Unknown command "${command ?? ''}". Use migrate, down, status or seed.`);
    }
  } finally {
    await sequelize.close();
  }
}

main(process.argv[2]).catch((error: Error) => {
  process.stderr.write(`[db] ${error.message}\n`);
  process.exit(1);
});
