import { defineConfig } from '@playwright/test';

// `npm test` exports the test ports (scripts/local-env.sh test); these defaults match them.
const port = Number(process.env.PORT ?? 3100);
const mailbox = process.env.MAILBOX_URL ?? 'http://127.0.0.1:2680';
const workerHealth = process.env.WORKER_HEALTH_URL ?? 'http://127.0.0.1:4690';

export default defineConfig({
  testDir: 'e2e',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  workers: 1,
  retries: 0,
  reporter: [['list']],
  outputDir: 'test-results/playwright',
  use: {
    baseURL: `http://localhost:${port}`,
    screenshot: 'only-on-failure',
    trace: 'retain-on-failure',
    launchOptions: {
      // Debian's chromium; Playwright never downloads a browser here.
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  projects: [{ name: 'chromium', use: { browserName: 'chromium', viewport: { width: 1440, height: 900 } } }],
  webServer: [
    { command: 'npx tsx scripts/local-services.ts', url: `${mailbox}/health`, reuseExistingServer: false, timeout: 60_000 },
    { command: 'npx tsx --conditions=react-server scripts/worker.ts', url: `${workerHealth}/health`, reuseExistingServer: false, timeout: 60_000 },
    {
      command: `node node_modules/next/dist/bin/next start -p ${port}`,
      url: `http://localhost:${port}/api/health`,
      reuseExistingServer: false,
      timeout: 90_000,
    },
  ],
});
