'use client';

import { FormProblem } from '@/components/form-problem';
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { authClient } from '@/lib/auth-client';
import { signUpSchema, type SignUp } from '@/lib/validations/auth';
import { isPasswordRefusal } from '@/lib/password-refusals';

export function SignUpForm({ email, invitation }: { email: string; invitation?: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<SignUp>({ resolver: zodResolver(signUpSchema), defaultValues: { name: '', email, password: '' } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    // After the e-mailed link is followed, the user lands signed in on the invitation or the app.
    const callbackURL = invitation ? `/accept-invitation/${invitation}` : '/welcome';
    const { error } = await authClient.signUp.email({ ...values, callbackURL });
    if (!error) {
      router.push(`/verify?email=${encodeURIComponent(values.email)}`);
      return;
    }
    // A common or the demo's published password is the password's problem: said under it, as the reset form does.
    if (isPasswordRefusal(error.code) && error.message) form.setError('password', { message: error.message });
    else if (error.status === 422 && /exist/i.test(error.message ?? '')) setProblem('An account with this e-mail already exists. Sign in instead.');
    else if (error.status === 429) setProblem('Too many attempts. Please wait a minute and try again.');
    else setProblem(error.message ?? 'Creating the account did not work. Please try again.');
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-4">
      <Input label="Your name" autoComplete="name" error={errors.name?.message} {...form.register('name')} />
      <Input label="E-mail" type="email" autoComplete="email" error={errors.email?.message} defaultValue={email} {...form.register('email')} />
      <Input
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <FormProblem message={problem} />
      <Button type="submit" busy={isSubmitting}>
        Create account
      </Button>
    </form>
  );
}
