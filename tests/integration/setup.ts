import { afterAll } from 'vitest';
import { closeSequelize } from '@/lib/db';

process.env.NEXTAUTH_SECRET ??= 'integration-test-secret';

afterAll(async () => {
  await closeSequelize();
});
