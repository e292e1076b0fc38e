import { ChangeTime } from '@/components/circuits/ChangeTime';
import type { MailboxMessage } from '@/lib/mail/mailbox-message';

type MailMessageListProps = {
  messages: readonly MailboxMessage[];
  selectedId: string | null;
  onSelect: (id: string) => void;
};

export function MailMessageList({ messages, selectedId, onSelect }: MailMessageListProps) {
  return (
    <ul className="divide-y divide-rule overflow-hidden rounded-lg border border-rule bg-paper-raised">
      {messages.map((message) => {
        const selected = message.id === selectedId;
        return (
          <li key={message.id}>
            <button
              type="button"
              onClick={() => onSelect(message.id)}
              aria-pressed={selected}
              className={[
                'block w-full px-4 py-3 text-left text-sm',
                selected ? 'bg-accent-soft' : 'hover:bg-paper-sunk',
              ].join(' ')}
              data-testid="mailbox-message"
            >
              <span className="flex items-baseline justify-between gap-3">
                <span className="min-w-0 truncate text-ink-soft">{message.to.join(', ')}</span>
                <span className="shrink-0 text-xs text-ink-soft">
                  <ChangeTime iso={message.receivedAt} />
                </span>
              </span>
              <span className="mt-0.5 block truncate font-medium text-ink">
                {message.subject || '(no subject)'}
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
}
