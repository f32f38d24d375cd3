import Link from 'next/link';
import { notFound } from 'next/navigation';
import { canSeeInbox } from '@/lib/inbox-access';
import { formatDateTime } from '@/lib/format';
import { findMail } from '@/lib/mail-sink-store';

export const dynamic = 'force-dynamic';

export default async function MessagePage({ params }: { params: Promise<{ messageId: string }> }) {
  if (!(await canSeeInbox())) notFound();
  const { messageId } = await params;
  const mail = await findMail(messageId);
  if (!mail) notFound();
  // Links in the plain-text body are made clickable; the HTML body is not rendered (no script risk).
  const parts = mail.text.split(/(https?:\/\/\S+)/g);
  return (
    <main className="mx-auto max-w-3xl px-6 py-10">
      <Link href="/inbox" className="text-tide-600 underline">
        ← Local inbox
      </Link>
      <h1 className="mt-4">{mail.subject}</h1>
      <p className="mt-1 text-caption text-ink-muted">
        To {mail.to.join(', ')} · from {mail.from} · {formatDateTime(mail.receivedAt)}
      </p>
      <div className="mt-6 whitespace-pre-wrap rounded-card border border-line bg-paper-raised p-6" data-testid="mail-body">
        {parts.map((part, k) =>
          /^https?:\/\//.test(part) ? (
            <a key={k} href={part} className="break-all text-tide-600 underline">
              {part}
            </a>
          ) : (
            <span key={k}>{part}</span>
          ),
        )}
      </div>
    </main>
  );
}
