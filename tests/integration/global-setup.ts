import { closeSequelize, getSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';

/** Brings the test database (DATABASE_URL from `npm test`) to the newest schema once per run. */
export default async function setup(): Promise<void> {
  if (!process.env.DATABASE_URL) {
    throw new Error('DATABASE_URL is not set: run integration tests through `npm test`, which starts the test database');
  }
  await createMigrator(getSequelize()).up();
  await closeSequelize();
}
