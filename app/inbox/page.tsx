import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { Wordmark } from '@/components/wordmark';
import { canSeeInbox } from '@/lib/inbox-access';
import { formatDateTime } from '@/lib/format';
import { listMail } from '@/lib/mail-sink-store';

export const metadata: Metadata = { title: 'Local inbox' };
export const dynamic = 'force-dynamic';

/** Every message the local sink caught, so a person trying the demo can follow e-mailed links. */
export default async function InboxPage() {
  if (!(await canSeeInbox())) notFound();
  const messages = await listMail();
  return (
    <main className="mx-auto max-w-4xl px-6 py-10">
      <Wordmark />
      <h1 className="mt-6">Local inbox</h1>
      <p className="mt-1 text-ink-soft">
        This installation sends no real e-mail: every message is kept here. It exists only while the local mail sink is in use.
      </p>
      {messages.length === 0 ? (
        <p className="mt-8 text-ink-muted">No messages yet.</p>
      ) : (
        <ul className="mt-8 divide-y divide-line rounded-card border border-line bg-paper-raised">
          {messages.map((m) => (
            <li key={m.id}>
              <Link href={`/inbox/${m.id}`} className="flex flex-wrap justify-between gap-2 px-4 py-3 hover:bg-paper-sunk">
                <span>
                  <span className="font-medium text-ink">{m.subject}</span>
                  <span className="ml-2 text-ink-muted">to {m.to.join(', ')}</span>
                </span>
                <span className="text-caption text-ink-muted">{formatDateTime(m.receivedAt)}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </main>
  );
}
