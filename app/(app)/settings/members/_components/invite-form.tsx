'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Select } from '@/components/ui/select';
import { useToast } from '@/components/ui/toast';
import { roleLabels, roleNames } from '@/lib/permissions';
import { inviteSchema, type Invite } from '@/lib/validations/auth';
import { reachAction } from '@/lib/reach-action';
import { inviteMemberAction } from '../actions';

export function InviteForm() {
  const toast = useToast();
  const form = useForm<Invite>({ resolver: zodResolver(inviteSchema), defaultValues: { email: '', role: 'analyst' } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    const result = await reachAction(() => inviteMemberAction(values));
    if (result.ok) {
      toast(result.message, 'success');
      form.reset({ email: '', role: values.role });
      return;
    }
    for (const [field, messages] of Object.entries(result.fields ?? {})) form.setError(field as keyof Invite, { message: messages[0] });
    toast(result.message, 'error');
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-wrap items-start gap-4" aria-label="Invite a member">
      <Input label="E-mail" type="email" className="min-w-64 flex-1" error={errors.email?.message} {...form.register('email')} />
      <Select label="Role" options={roleNames.map((r) => ({ value: r, label: roleLabels[r] }))} error={errors.role?.message} {...form.register('role')} />
      <Button type="submit" busy={isSubmitting} className="mt-5">
        Send invitation
      </Button>
    </form>
  );
}
