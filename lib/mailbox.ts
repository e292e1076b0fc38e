import 'server-only';
import { serverEnv } from '@/lib/env';
import { AppError } from '@/lib/errors';
import type { MailboxMessage } from '@/lib/mail/mailbox-message';

/** Messages held by the local mail catcher; absent in production, where MAILBOX_URL is unset. */
export async function listCaughtMail(): Promise<MailboxMessage[]> {
  const base = serverEnv().MAILBOX_URL;
  if (!base) throw new AppError('not_found', 'mailbox', 'No local mail catcher is configured');
  const response = await fetch(new URL('/messages', base), { cache: 'no-store', signal: AbortSignal.timeout(5000) }).catch(() => null);
  if (!response?.ok) throw new AppError('unavailable', 'mailbox', 'The local mail catcher does not answer');
  const body = (await response.json()) as { messages: MailboxMessage[] };
  return body.messages.slice(0, 200);
}
