'use client';

import { When } from '@/components/ui/when';
import useSWR from 'swr';
import { swrFetcher } from '@/lib/http/client';

type Message = { to: string; subject: string; text: string; html?: string; at: string | number };

const URL_RE = /(https?:\/\/[^\s<>"]+)/g;

// Plain text with its http(s) links made clickable; nothing else is interpreted.
function Linked({ text }: { text: string }) {
  return (
    <>
      {text.split(URL_RE).map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="break-all font-medium text-accent underline">
            {part}
          </a>
        ) : (
          <span key={i}>{part}</span>
        ),
      )}
    </>
  );
}

export function MailboxList() {
  const { data, error, isLoading } = useSWR<Message[]>('/api/dev/mailbox', swrFetcher, { refreshInterval: 3000 });
  if (error) return <p role="alert" className="text-band-off">Could not read the mailbox: {(error as Error).message}</p>;
  if (isLoading || !data) return <p role="status" className="text-ink-soft">Loading messages…</p>;
  if (data.length === 0) return <p className="rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">No messages yet.</p>;
  return (
    <ol className="space-y-3" aria-label="Messages">
      {data.map((m, i) => (
        <li key={`${m.at}-${i}`} className="rounded-lg border border-panel-line bg-white p-4">
          <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
            <h2 className="font-semibold">{m.subject || '(no subject)'}</h2>
            <time dateTime={new Date(m.at).toISOString()} className="num text-sm text-ink-soft">
              <When at={new Date(m.at).getTime()} />
            </time>
          </div>
          <p className="mt-0.5 break-all text-sm text-ink-soft">To: {m.to}</p>
          <p className="mt-3 whitespace-pre-wrap break-words text-sm">
            <Linked text={m.text} />
          </p>
        </li>
      ))}
    </ol>
  );
}
