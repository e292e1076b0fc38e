import { requestJson } from '@/components/api/request-json';
import type { MailboxMessage } from '@/lib/mail/mailbox-message';

export function fetchMailbox(signal: AbortSignal) {
  return requestJson<{ messages: MailboxMessage[] }>('/api/mailbox', signal);
}

/** Newest first whatever order the catcher keeps, because the message just sent is the one wanted. */
export function newestFirst(messages: readonly MailboxMessage[]): MailboxMessage[] {
  return [...messages].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
}
