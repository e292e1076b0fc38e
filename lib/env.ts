import { z } from 'zod';

/**
 * Server configuration read from the environment. `npm start` and `npm test`
 * export values that point at the local stand-ins; production sets its own.
 */
const envSchema = z.object({
  DATABASE_URL: z.string().url(),
  APP_URL: z.string().url().default('http://localhost:3000'),
  SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
  MAILBOX_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Airproof <no-reply@airproof.local>'),
  /** An S3-compatible endpoint (the local fake); unset means AWS itself. Credentials come from the AWS_* variables. */
  S3_ENDPOINT: z.string().url().optional(),
  S3_BUCKET: z.string().min(1).default('airproof'),
  S3_REGION: z.string().min(1).default('us-east-1'),
});

export type ServerEnv = z.infer<typeof envSchema>;

let cached: ServerEnv | undefined;

export function serverEnv(): ServerEnv {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const fields = parsed.error.issues.map((i) => i.path.join('.')).join(', ');
      throw new Error(`Missing or invalid server configuration: ${fields}`);
    }
    cached = parsed.data;
  }
  return cached;
}
