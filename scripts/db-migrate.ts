// `npm run db:migrate` / `db:rollback`: apply or revert migrations on DATABASE_URL.
import { closeSequelize, getSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';

async function main(): Promise<void> {
  const direction = process.argv[2] ?? 'up';
  const migrator = createMigrator(getSequelize());
  if (direction === 'up') {
    const done = await migrator.up();
    console.log(done.length ? `applied ${done.map((m) => m.name).join(', ')}` : 'database schema is current');
  } else if (direction === 'down') {
    const to = process.argv[3] === '--all' ? 0 : undefined;
    const done = await migrator.down(to === 0 ? { to: 0 } : undefined);
    console.log(`reverted ${done.map((m) => m.name).join(', ') || 'nothing'}`);
  } else {
    throw new Error(`unknown direction ${direction}; use up or down`);
  }
}

main()
  .then(() => closeSequelize())
  .catch(async (error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    await closeSequelize();
    process.exit(1);
  });
