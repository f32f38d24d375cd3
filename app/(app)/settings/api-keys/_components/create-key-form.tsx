'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Select } from '@/components/ui/select';
import { useToast } from '@/components/ui/toast';
import { ApiError, sendJson } from '@/lib/api-client';
import { roleLabels } from '@/lib/permissions';
import { apiKeyCreateSchema, apiKeyRoles } from '@/lib/validations/api-key';

const lifetimes = [
  { value: '90', label: '90 days' },
  { value: '365', label: 'One year' },
  { value: '730', label: 'Two years' },
  { value: '30', label: '30 days' },
  { value: 'never', label: 'Never' },
];

const formSchema = apiKeyCreateSchema.pick({ name: true, role: true }).extend({ lifetime: z.enum(lifetimes.map((l) => l.value)) });
type FormValues = z.infer<typeof formSchema>;

interface Created {
  name: string;
  key: string;
}

export function CreateKeyForm() {
  const toast = useToast();
  const router = useRouter();
  const [created, setCreated] = useState<Created | null>(null);
  const [copied, setCopied] = useState(false);
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { name: '', role: 'analyst', lifetime: '365' } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async ({ name, role, lifetime }) => {
    try {
      const made = await sendJson<Created>('POST', '/api/v1/api-keys', { name, role, ...(lifetime === 'never' ? {} : { expiresInDays: Number(lifetime) }) });
      setCreated({ name: made.name, key: made.key });
      setCopied(false);
      form.reset({ name: '', role, lifetime });
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        for (const [field, messages] of Object.entries(error.fields ?? {}))
          if (field in form.getValues()) form.setError(field as keyof FormValues, { message: messages[0] });
        toast(error.message, 'error');
      } else toast('The key could not be created; try again.', 'error');
    }
  });
  return (
    <>
      <form onSubmit={onSubmit} noValidate className="flex flex-wrap items-start gap-4" aria-label="Create an API key">
        <Input label="Name" className="min-w-64 flex-1" placeholder="Planning system sync" error={errors.name?.message} {...form.register('name')} />
        <Select label="Role" options={apiKeyRoles.map((r) => ({ value: r, label: roleLabels[r] }))} error={errors.role?.message} {...form.register('role')} />
        <Select label="Expires after" options={lifetimes} error={errors.lifetime?.message} {...form.register('lifetime')} />
        <Button type="submit" busy={isSubmitting} className="mt-5">
          Create key
        </Button>
      </form>
      {created ? (
        <div role="status" className="mt-4 rounded-card border border-tide-300 bg-tide-50 p-4">
          <p className="font-medium">The key “{created.name}” is ready. Copy it now: Leeway keeps only a hash of it and cannot show it again.</p>
          <div className="mt-3 flex flex-wrap items-end gap-3">
            <Input label="Key" readOnly value={created.key} className="min-w-96 flex-1 font-mono" onFocus={(e) => e.currentTarget.select()} />
            <Button
              variant="secondary"
              onClick={async () => {
                await navigator.clipboard.writeText(created.key).then(
                  () => setCopied(true),
                  () => toast('The browser did not allow copying; select the key and copy it by hand.', 'error'),
                );
              }}
            >
              {copied ? 'Copied' : 'Copy key'}
            </Button>
            <Button variant="quiet" onClick={() => setCreated(null)}>
              Done
            </Button>
          </div>
        </div>
      ) : null}
    </>
  );
}
