import type { Metadata } from 'next';
import Link from 'next/link';
import { ResetPasswordForm } from './_components/reset-password-form';

export const metadata: Metadata = { title: 'Choose a new password' };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string }> }) {
  const { token, error } = await searchParams;
  if (!token || error) {
    return (
      <>
        <h1>That reset link did not work</h1>
        <p className="mt-2 text-ink-soft">It may have expired or been used already. Ask for a new one.</p>
        <Link href="/forgot-password" className="mt-6 inline-block text-tide-600 underline">
          Ask for a new link
        </Link>
      </>
    );
  }
  return (
    <>
      <h1>Choose a new password</h1>
      <ResetPasswordForm token={token} />
    </>
  );
}
