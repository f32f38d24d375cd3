import type { Metadata } from 'next';
import Link from 'next/link';
import { SignUpForm } from './_components/sign-up-form';

export const metadata: Metadata = { title: 'Create an account' };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ email?: string; invitation?: string }> }) {
  const { email, invitation } = await searchParams;
  return (
    <>
      <h1>Create your account</h1>
      <p className="mt-2 text-ink-soft">
        {invitation
          ? 'Create an account with the invited e-mail address, then accept the invitation.'
          : 'You will confirm your e-mail address before you sign in.'}
      </p>
      <SignUpForm email={email ?? ''} invitation={invitation} />
      <p className="mt-6 text-body">
        Already have an account?{' '}
        <Link href="/sign-in" className="text-tide-600 underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
