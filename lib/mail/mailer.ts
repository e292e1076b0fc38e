import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { serverEnv } from '@/lib/env';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

let transport: Transporter | undefined;

/** Sends one message over SMTP (SMTP_URL): the local catcher in development and tests. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  transport ??= nodemailer.createTransport(serverEnv().SMTP_URL);
  await transport.sendMail({ from: serverEnv().MAIL_FROM, ...mail });
}
