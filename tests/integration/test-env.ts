/**
 * Defaults for running the integration project by hand; `npm test` exports the
 * same values (scripts/local-env.sh test), and values already set win.
 */
export function applyTestEnvDefaults(): void {
  process.env.NEXTAUTH_SECRET ??= 'integration-test-secret';
  process.env.SMTP_URL ??= 'smtp://127.0.0.1:2625';
  process.env.MAILBOX_URL ??= 'http://127.0.0.1:2680';
  process.env.APP_URL ??= 'http://localhost:3100';
  process.env.S3_ENDPOINT ??= 'http://127.0.0.1:4669';
  process.env.S3_BUCKET ??= 'airproof';
  process.env.S3_REGION ??= 'us-east-1';
  process.env.AWS_ACCESS_KEY_ID ??= 'S3RVER';
  process.env.AWS_SECRET_ACCESS_KEY ??= 'S3RVER';
}
