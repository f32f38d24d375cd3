'use client';

import { FormProblem } from '@/components/form-problem';
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { authClient, noAnswer } from '@/lib/auth-client';
import { resetPasswordSchema } from '@/lib/validations/auth';

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<z.infer<typeof resetPasswordSchema>>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { password: '', confirm: '' } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async ({ password }) => {
    setProblem(null);
    const { error } = await authClient.resetPassword({ newPassword: password, token });
    if (noAnswer(error)) return setProblem(error.message);
    if (error) return setProblem('This reset link has expired or was already used. Ask for a new one.');
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
      <Button type="submit" busy={isSubmitting}>
        Save new password
      </Button>
    </form>
  );
}
