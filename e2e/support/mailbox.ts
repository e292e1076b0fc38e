/** Reads the local mail catcher that `npm test` starts (MAILBOX_URL). */
export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
}

const mailboxUrl = () => process.env.MAILBOX_URL ?? 'http://127.0.0.1:2680';

export async function waitForMail(to: string, subject: RegExp, timeoutMs = 10_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await fetch(`${mailboxUrl()}/messages?to=${encodeURIComponent(to)}`);
    const { messages } = (await response.json()) as { messages: CaughtMail[] };
    const found = messages.find((m) => subject.test(m.subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export function linkIn(mail: CaughtMail, path: string): string {
  const match = new RegExp(`https?://[^\\s]+${path.replace(/\//g, '\\/')}\\?token=[A-Za-z0-9_-]+`).exec(mail.text);
  if (!match) throw new Error(`no ${path} link in mail "${mail.subject}"`);
  return match[0];
}

export function uniqueEmail(prefix: string): string {
  return `${prefix}-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e6).toString(36)}@e2e.example`;
}
