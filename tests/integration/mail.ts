import type { MailboxMessage } from '@/lib/mail/mailbox-message';

/** Messages the local catcher holds for one address, newest first. */
export async function mailTo(address: string): Promise<MailboxMessage[]> {
  const url = new URL('/messages', process.env.MAILBOX_URL);
  url.searchParams.set('to', address.toLowerCase());
  const response = await fetch(url);
  return ((await response.json()) as { messages: MailboxMessage[] }).messages;
}

/** The token in the first link to `path` in a message's text part. */
export function tokenFromLink(message: MailboxMessage, path: string): string {
  const match = new RegExp(`${path.replace(/\//g, '\\/')}\\?token=([A-Za-z0-9_-]+)`).exec(message.text);
  if (!match?.[1]) throw new Error(`no ${path} link in: ${message.text}`);
  return match[1];
}
