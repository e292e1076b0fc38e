import { afterAll } from 'vitest';
import { closeSequelize } from '@/lib/db';

process.env.NEXTAUTH_SECRET ??= 'integration-test-secret';
// Same defaults as the global setup, which starts the catcher in another context.
process.env.SMTP_URL ??= 'smtp://127.0.0.1:2625';
process.env.MAILBOX_URL ??= 'http://127.0.0.1:2680';
process.env.APP_URL ??= 'http://localhost:3100';

afterAll(async () => {
  await closeSequelize();
});
