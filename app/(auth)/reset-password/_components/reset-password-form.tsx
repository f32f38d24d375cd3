'use client';

import { FormProblem } from '@/components/form-problem';
import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { authClient, noAnswer } from '@/lib/auth-client';
import { resetPasswordSchema } from '@/lib/validations/auth';
import { isPasswordRefusal } from '@/lib/password-refusals';

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [linkFailed, setLinkFailed] = useState(false);
  const form = useForm<z.infer<typeof resetPasswordSchema>>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { password: '', confirm: '' } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async ({ password }) => {
    setProblem(null);
    setLinkFailed(false);
    const { error } = await authClient.resetPassword({ newPassword: password, token });
    if (noAnswer(error)) return setProblem(error.message);
    // The server refuses a common or the demo's published password before it reads the link:
    // those are the password's problem, not the link's (every refusal read "link expired").
    if (error && isPasswordRefusal(error.code)) return form.setError('password', { message: error.message });
    if (error?.status === 429) return setProblem('Too many attempts. Please wait a minute and try again.');
    if (error) {
      setLinkFailed(true);
      return setProblem('This reset link has expired or was already used.');
    }
    router.push('/sign-in?reset=1');
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-4">
      <Input
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Input label="Repeat it" type="password" autoComplete="new-password" error={errors.confirm?.message} {...form.register('confirm')} />
      <FormProblem message={problem} />
      {linkFailed ? (
        <Link href="/forgot-password" className="text-tide-600 underline">
          Ask for a new link
        </Link>
      ) : null}
      <Button type="submit" busy={isSubmitting}>
        Save new password
      </Button>
    </form>
  );
}
