import type { Metadata } from 'next';
import Link from 'next/link';
import { ForgotPasswordForm } from './_components/forgot-password-form';

export const metadata: Metadata = { title: 'Reset your password' };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1>Reset your password</h1>
      <p className="mt-2 text-ink-soft">Enter your e-mail address and we will send you a link to choose a new password.</p>
      <ForgotPasswordForm />
      <Link href="/sign-in" className="mt-6 inline-block text-tide-600 underline">
        Back to sign-in
      </Link>
    </>
  );
}
