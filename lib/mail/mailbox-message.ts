/** One message as the local mail catcher keeps it and serves it at MAILBOX_URL/messages. */
export interface MailboxMessage {
  id: string;
  /** ISO 8601. */
  receivedAt: string;
  from: string;
  /** Envelope recipients, lower-cased. */
  to: string[];
  subject: string;
  text: string;
  html: string;
}
