import { useState } from 'react';
import type { OutboxMessage } from '../../../../shared/schemas/outbox.ts';
import { EmptyState } from '../../../components/ui/empty-state.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { MessageText } from './message-text.tsx';

/** Messages on the left, the chosen one on the right; the newest is open at first. */
export function OutboxView({ messages }: { messages: OutboxMessage[] }) {
  const [openId, setOpenId] = useState<string | undefined>();
  if (messages.length === 0) {
    return <EmptyState title="No mail yet">Invitations and password-reset links sent by this server will appear here.</EmptyState>;
  }
  const open = messages.find((m) => m.id === openId) ?? messages[0];

  return (
    <div className="grid grid-cols-1 gap-4 md:grid-cols-[minmax(15rem,20rem)_1fr]">
      <ol aria-label="Messages" className="max-h-[70vh] self-start divide-y divide-rule overflow-y-auto rounded border border-rule bg-paper-raised">
        {messages.map((m) => (
          <li key={m.id}>
            <button
              type="button"
              aria-current={m.id === open.id || undefined}
              onClick={() => setOpenId(m.id)}
              className={`block w-full px-3 py-2 text-left hover:bg-accent-wash/50 ${m.id === open.id ? 'bg-accent-wash/70 shadow-[inset_3px_0_0_var(--color-accent)]' : ''}`}
            >
              <span className="block truncate text-sm font-medium">{m.subject}</span>
              <span className="block truncate text-xs text-ink-soft">to {m.to}</span>
              <span className="figures block text-2xs text-ink-faint">{formatDateTime(m.receivedAt)}</span>
            </button>
          </li>
        ))}
      </ol>
      <article aria-label={messageLabel(open)} className="min-w-0 rounded border border-rule bg-paper-raised">
        <header className="border-b border-rule px-4 py-3">
          <h2 className="text-lg font-semibold">{open.subject}</h2>
          <dl className="mt-1 grid grid-cols-[4rem_1fr] gap-x-2 text-xs text-ink-soft">
            <dt className="text-ink-faint">From</dt>
            <dd>{open.from}</dd>
            <dt className="text-ink-faint">To</dt>
            <dd>{open.to}</dd>
            <dt className="text-ink-faint">Received</dt>
            <dd className="figures">{formatDateTime(open.receivedAt)}</dd>
          </dl>
        </header>
        <div className="px-4 py-3">
          <MessageText text={open.text} />
        </div>
      </article>
    </div>
  );
}

function messageLabel(m: OutboxMessage): string {
  return `Message: ${m.subject}`;
}
