import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { closeSequelize, getSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';
import { startMailCatcher, type MailCatcher } from '@/scripts/local/mail-catcher';
import { startStorageFake } from '@/scripts/local/storage-fake';
import { applyTestEnvDefaults } from './test-env';

/**
 * Brings the test database (DATABASE_URL from `npm test`) to the newest schema and
 * starts the local mail catcher and S3 fake, once per run.
 */
export default async function setup(): Promise<() => Promise<void>> {
  if (!process.env.DATABASE_URL) {
    throw new Error('DATABASE_URL is not set: run integration tests through `npm test`, which starts the test database');
  }
  await createMigrator(getSequelize()).up();
  await closeSequelize();

  applyTestEnvDefaults();
  const directory = await mkdtemp(path.join(os.tmpdir(), 'airproof-mail-'));
  const catcher: MailCatcher = await startMailCatcher({
    smtpPort: Number(new URL(process.env.SMTP_URL!).port),
    httpPort: Number(new URL(process.env.MAILBOX_URL!).port),
    directory,
  });
  const storageDirectory = await mkdtemp(path.join(os.tmpdir(), 'airproof-s3-'));
  const storage = await startStorageFake({ port: Number(new URL(process.env.S3_ENDPOINT!).port), directory: storageDirectory, bucket: process.env.S3_BUCKET! });
  return async () => {
    await Promise.all([catcher.close(), storage.close()]);
    await rm(directory, { recursive: true, force: true });
    await rm(storageDirectory, { recursive: true, force: true });
  };
}
