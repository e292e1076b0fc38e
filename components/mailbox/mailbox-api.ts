import { requestJson } from '@/components/api/request-json';

export type CaughtMessage = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
};

export function fetchMailbox(signal: AbortSignal) {
  return requestJson<{ messages: CaughtMessage[] }>('/api/mailbox', signal);
}

/** Newest first whatever order the catcher keeps, because the message just sent is the one wanted. */
export function newestFirst(messages: readonly CaughtMessage[]): CaughtMessage[] {
  return [...messages].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
}
