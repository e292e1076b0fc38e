import { formatAbsoluteTime } from '@/components/circuits/format-change-time';
import { HtmlPartFrame } from './HtmlPartFrame';
import { LinkedText } from './LinkedText';
import type { MailboxMessage } from '@/lib/mail/mailbox-message';

export function MailMessageView({ message }: { message: MailboxMessage }) {
  return (
    <article className="space-y-4 rounded-lg border border-rule bg-paper-raised p-4 sm:p-5">
      <header>
        <h2 className="break-words text-lg">{message.subject || '(no subject)'}</h2>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="text-ink-soft">From</dt>
          <dd className="break-all text-ink">{message.from}</dd>
          <dt className="text-ink-soft">To</dt>
          <dd className="break-all text-ink">{message.to.join(', ')}</dd>
          <dt className="text-ink-soft">Received</dt>
          <dd className="text-ink">
            <time dateTime={message.receivedAt}>{formatAbsoluteTime(new Date(message.receivedAt))}</time>
          </dd>
        </dl>
      </header>

      <section aria-label="Plain-text part">
        <h3 className="text-xs font-medium uppercase tracking-wide text-ink-soft">Plain text</h3>
        <div
          className="mt-1 whitespace-pre-wrap break-words rounded-md border border-rule bg-paper p-3 font-mono text-sm text-ink"
          data-testid="mailbox-body"
        >
          {message.text ? <LinkedText text={message.text} /> : <span className="text-ink-soft">(empty)</span>}
        </div>
      </section>

      {message.html ? (
        <section aria-label="HTML part">
          <h3 className="text-xs font-medium uppercase tracking-wide text-ink-soft">
            HTML, shown sandboxed: no scripts or remote content
          </h3>
          <div className="mt-1">
            <HtmlPartFrame html={message.html} title={`HTML part of “${message.subject}”`} />
          </div>
        </section>
      ) : null}
    </article>
  );
}
