import type { Metadata } from 'next';
import Link from 'next/link';
import { canSeeInbox } from '@/lib/inbox-access';

export const metadata: Metadata = { title: 'Confirm your e-mail' };

export default async function VerifyPage({ searchParams }: { searchParams: Promise<{ email?: string; error?: string }> }) {
  const { email, error } = await searchParams;
  if (error) {
    return (
      <>
        <h1>That link did not work</h1>
        <p className="mt-2 text-ink-soft">It may have expired or been used already. Sign in to receive a new one.</p>
        <Link href="/sign-in" className="mt-6 inline-block text-tide-600 underline">
          Go to sign-in
        </Link>
      </>
    );
  }
  return (
    <>
      <h1>Check your inbox</h1>
      <p className="mt-2 text-ink-soft">
        We sent a confirmation link to {email ? <strong className="text-ink">{email}</strong> : 'your e-mail address'}. Follow it to finish creating your
        account.
      </p>
      {(await canSeeInbox()) ? (
        <p className="mt-4 rounded-md bg-tide-50 px-3 py-2 text-tide-700">
          This is a local installation: messages are kept in the{' '}
          <Link href="/inbox" className="underline">
            local inbox
          </Link>
          .
        </p>
      ) : null}
    </>
  );
}
