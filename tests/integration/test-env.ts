/**
 * Defaults for running the integration project by hand; `npm test` exports the
 * same values (scripts/local-env.sh test), and values already set win.
 */
export function applyTestEnvDefaults(): void {
  process.env.NEXTAUTH_SECRET ??= 'integration-test-secret';
  process.env.SMTP_URL ??= 'smtp://127.0.0.1:2625';
  process.env.MAILBOX_URL ??= 'http://127.0.0.1:2680';
  process.env.APP_URL ??= 'http://localhost:3100';
}
