import { useState } from 'react';
import { useOutbox } from '@/api/outbox.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

/** Mail caught by the local SMTP catcher, newest first. */
export function Component() {
  const outbox = useOutbox();
  const [openId, setOpenId] = useState<string>();
  const messages = outbox.data?.data ?? [];
  return (
    <>
      <PageHeader
        title="Outbox"
        description="E-mail Starproof has sent. While no SMTP relay is configured, messages are caught here instead of being delivered."
      />
      {outbox.data && !outbox.data.meta.catcher && <Notice>Mail goes to a real relay, so nothing is caught here.</Notice>}
      {outbox.error && <Notice tone="error">{outbox.error.message}</Notice>}
      {outbox.data && messages.length === 0 && outbox.data.meta.catcher && <p className="text-sm text-muted">No messages yet.</p>}
      <ul className="divide-y divide-rule rounded-lg border border-rule bg-panel">
        {messages.map((m) => (
          <li key={m.id}>
            <button
              type="button"
              aria-expanded={openId === m.id}
              onClick={() => setOpenId(openId === m.id ? undefined : m.id)}
              className="flex w-full flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3 text-left hover:bg-wash"
            >
              <span className="min-w-0 [overflow-wrap:anywhere]">
                <span className="block font-medium">{m.subject}</span>
                <span className="block text-xs text-muted">To {m.to}</span>
              </span>
              <time className="shrink-0 text-xs text-muted" dateTime={m.receivedAt}>
                {formatDateTime(m.receivedAt)}
              </time>
            </button>
            {openId === m.id && (
              <pre className="whitespace-pre-wrap break-words border-t border-rule bg-wash px-4 py-3 font-sans text-sm">
                {m.text}
              </pre>
            )}
          </li>
        ))}
      </ul>
    </>
  );
}
