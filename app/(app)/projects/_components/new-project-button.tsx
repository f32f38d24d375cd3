'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormProblem } from '@/components/form-problem';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Input } from '@/components/ui/input';
import { ApiError, sendJson } from '@/lib/api-client';
import { projectCreateSchema } from '@/lib/validations/project';

type Fields = z.input<typeof projectCreateSchema>;

/** Opens a short form for a new project; on success goes to the project's page. */
export function NewProjectButton({ defaultCurrency }: { defaultCurrency: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<Fields>({ resolver: zodResolver(projectCreateSchema), defaultValues: { name: '', description: '', currency: defaultCurrency } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    try {
      const { project } = await sendJson<{ project: { id: string } }>('POST', '/api/v1/projects', values);
      router.push(`/projects/${project.id}`);
    } catch (error) {
      if (error instanceof ApiError && error.fields)
        for (const [field, messages] of Object.entries(error.fields)) form.setError(field as keyof Fields, { message: messages[0] });
      setProblem(error instanceof Error ? error.message : 'Creating the project did not work.');
    }
  });
  return (
    <>
      <Button onClick={() => setOpen(true)}>New project</Button>
      <Dialog open={open} title="New project" onClose={() => setOpen(false)}>
        <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
          <Input label="Name" autoFocus error={errors.name?.message} {...form.register('name')} />
          <Input label="What is it?" hint="One or two sentences for the committee." error={errors.description?.message} {...form.register('description')} />
          <Input
            label="Currency"
            hint="ISO 4217 code; your organisation's default is filled in."
            maxLength={3}
            error={errors.currency?.message}
            {...form.register('currency')}
          />
          <FormProblem message={problem} />
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Cancel
            </Button>
            <Button type="submit" busy={isSubmitting}>
              Create project
            </Button>
          </div>
        </form>
      </Dialog>
    </>
  );
}
