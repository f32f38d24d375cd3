'use client';

import { FormProblem } from '@/components/form-problem';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { authClient, noAnswer } from '@/lib/auth-client';
import { forgotPasswordSchema } from '@/lib/validations/auth';

export function ForgotPasswordForm() {
  const [sent, setSent] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<z.infer<typeof forgotPasswordSchema>>({ resolver: zodResolver(forgotPasswordSchema), defaultValues: { email: '' } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async ({ email }) => {
    setProblem(null);
    const { error } = await authClient.requestPasswordReset({ email, redirectTo: '/reset-password' });
    if (error?.status === 429) return setProblem('Too many requests. Please wait a minute and try again.');
    // The server answers the same whether or not the address has an account, so none can be
    // discovered; an error is a failure to send, never "no such account".
    if (error) return setProblem(noAnswer(error) ? error.message : 'The reset link could not be sent. Please try again.');
    setSent(true);
  });

  if (sent) return <p className="mt-6 rounded-md bg-moss-100 px-3 py-2 text-moss-700">If that address has an account, a reset link is on its way.</p>;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-4">
      <Input label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <FormProblem message={problem} />
      <Button type="submit" busy={isSubmitting}>
        Send reset link
      </Button>
    </form>
  );
}
