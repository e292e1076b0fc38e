// `npm run services`: the local mail catcher and S3 fake, configured from the
// environment that scripts/local-env.sh exports. Stops cleanly on SIGINT/SIGTERM.
import path from 'node:path';
import { startMailCatcher } from './local/mail-catcher';
import { startStorageFake } from './local/storage-fake';

function portOf(url: string | undefined, fallback: number): number {
  return url ? Number(new URL(url).port) || fallback : fallback;
}

async function main(): Promise<void> {
  const dir = process.env.LOCAL_SERVICES_DIR ?? path.join(process.cwd(), '.data', 'dev');
  const mail = await startMailCatcher({
    smtpPort: portOf(process.env.SMTP_URL, 2525),
    httpPort: portOf(process.env.MAILBOX_URL, 2580),
    directory: path.join(dir, 'mail'),
  });
  const storage = await startStorageFake({
    port: portOf(process.env.S3_ENDPOINT, 4569),
    directory: path.join(dir, 's3'),
    bucket: process.env.S3_BUCKET ?? 'airproof',
  });
  console.log(`local services: SMTP ${process.env.SMTP_URL}, mailbox ${process.env.MAILBOX_URL}, S3 ${process.env.S3_ENDPOINT}`);
  const stop = () => {
    void Promise.all([mail.close(), storage.close()]).finally(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
