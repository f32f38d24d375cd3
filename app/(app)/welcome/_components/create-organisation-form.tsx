'use client';

import { FormProblem } from '@/components/form-problem';
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { organisationCreateSchema } from '@/lib/validations/auth';
import { reachAction } from '@/lib/reach-action';
import { createOrganisationAction } from '../actions';

export function CreateOrganisationForm() {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<z.infer<typeof organisationCreateSchema>>({ resolver: zodResolver(organisationCreateSchema), defaultValues: { name: '' } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    const result = await reachAction(() => createOrganisationAction(values));
    if (result.ok) {
      router.push('/settings');
      router.refresh();
      return;
    }
    if (result.fields?.name) form.setError('name', { message: result.fields.name[0] });
    setProblem(result.message);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex max-w-md flex-col gap-4">
      <Input label="Organisation name" error={errors.name?.message} {...form.register('name')} />
      <FormProblem message={problem} />
      <Button type="submit" busy={isSubmitting}>
        Create organisation
      </Button>
    </form>
  );
}
