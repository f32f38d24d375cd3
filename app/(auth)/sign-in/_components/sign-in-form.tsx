'use client';

import { FormProblem } from '@/components/form-problem';
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { authClient, noAnswer } from '@/lib/auth-client';
import { signInSchema, type SignIn } from '@/lib/validations/auth';
import { PUBLISHED_PASSWORD } from '@/lib/password-refusals';

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<SignIn>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    const { error } = await authClient.signIn.email({ email: values.email, password: values.password });
    if (!error) {
      router.push(next);
      router.refresh();
      return;
    }
    // The server's own words where they say more than the status: how long this account must
    // wait (up to 15 minutes, not "a minute"), and why the demo's password is refused here.
    if ((error.code === 'ACCOUNT_BACKOFF' || error.code === PUBLISHED_PASSWORD || noAnswer(error)) && error.message) setProblem(error.message);
    else if (error.status === 403) setProblem('Please confirm your e-mail address first: use the link we sent you.');
    else if (error.status === 429) setProblem('Too many attempts from this address. Please wait a minute and try again.');
    else if (error.status === 401) setProblem('That e-mail and password do not match an account. Check them and try again.');
    else setProblem('Signing in did not work. Please try again.');
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-4">
      <Input label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <Input label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register('password')} />
      <FormProblem message={problem} />
      <Button type="submit" busy={isSubmitting}>
        Sign in
      </Button>
    </form>
  );
}
