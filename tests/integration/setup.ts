import { afterAll } from 'vitest';
import { closeSequelize } from '@/lib/db';
import { applyTestEnvDefaults } from './test-env';

// The global setup runs in another context, so each worker applies the same defaults.
applyTestEnvDefaults();

afterAll(async () => {
  await closeSequelize();
});
