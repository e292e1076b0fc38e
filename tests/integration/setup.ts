import { afterAll } from 'vitest';
import { closeSequelize } from '@/lib/db';
import { stopBoss } from '@/lib/jobs/queue';
import { applyTestEnvDefaults } from './test-env';

// The global setup runs in another context, so each worker applies the same defaults.
applyTestEnvDefaults();

afterAll(async () => {
  // A file that started or sent a proof holds a pg-boss with its own connections and timers.
  await stopBoss();
  await closeSequelize();
});
