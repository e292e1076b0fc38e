// Local stand-in for an SMTP relay: accepts every message, keeps it on disk and
// serves the mailbox as JSON over HTTP for the app's Mailbox page and the tests.
import { randomUUID } from 'node:crypto';
import { mkdir, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import http from 'node:http';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { MailboxMessage } from '@/lib/mail/mailbox-message';


export interface MailCatcher {
  close(): Promise<void>;
}

export async function startMailCatcher({ smtpPort, httpPort, directory }: { smtpPort: number; httpPort: number; directory: string }): Promise<MailCatcher> {
  await mkdir(directory, { recursive: true });
  const messages: MailboxMessage[] = [];
  for (const file of (await readdir(directory)).filter((f) => f.endsWith('.json')).sort()) {
    messages.push(JSON.parse(await readFile(path.join(directory, file), 'utf8')) as MailboxMessage);
  }

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Airproof local mail catcher',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const message: MailboxMessage = {
            id: randomUUID(),
            receivedAt: new Date().toISOString(),
            from: parsed.from?.text ?? session.envelope.mailFrom?.toString() ?? '',
            to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          };
          messages.push(message);
          await writeFile(path.join(directory, `${message.receivedAt.replace(/[:.]/g, '-')}-${message.id}.json`), JSON.stringify(message));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://localhost');
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(JSON.stringify(body));
    };
    if (url.pathname === '/health') return send(200, { ok: true, messages: messages.length });
    if (url.pathname === '/messages' && req.method === 'GET') {
      const to = url.searchParams.get('to')?.toLowerCase();
      const list = messages.filter((m) => !to || m.to.includes(to)).slice().reverse();
      return send(200, { messages: list });
    }
    if (url.pathname === '/messages' && req.method === 'DELETE') {
      messages.length = 0;
      void rm(directory, { recursive: true, force: true }).then(() => mkdir(directory, { recursive: true }));
      return send(200, { ok: true });
    }
    const match = /^\/messages\/([\w-]+)$/.exec(url.pathname);
    const found = match ? messages.find((m) => m.id === match[1]) : undefined;
    if (found) return send(200, found);
    return send(404, { error: 'not found' });
  });

  await new Promise<void>((resolve) => smtp.listen(smtpPort, '127.0.0.1', resolve));
  await new Promise<void>((resolve) => web.listen(httpPort, '127.0.0.1', resolve));
  return {
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => web.close(() => resolve()));
    },
  };
}
