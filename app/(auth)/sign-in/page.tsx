import type { Metadata } from 'next';
import Link from 'next/link';
import { SignInForm } from './_components/sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; reset?: string }> }) {
  const { next, reset } = await searchParams;
  // Only same-site paths are followed after sign-in.
  const safeNext = next && next.startsWith('/') && !next.startsWith('//') ? next : '/portfolio';
  return (
    <>
      <h1>Sign in</h1>
      {reset ? <p className="mt-2 rounded-md bg-moss-100 px-3 py-2 text-moss-700">Your password has been changed. Sign in with the new one.</p> : null}
      <SignInForm next={safeNext} />
      <div className="mt-6 flex justify-between text-body">
        <Link href="/forgot-password" className="text-tide-600 underline">
          Forgot your password?
        </Link>
        <Link href="/sign-up" className="text-tide-600 underline">
          Create an account
        </Link>
      </div>
    </>
  );
}
