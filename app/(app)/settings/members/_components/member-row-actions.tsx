'use client';

import { useState } from 'react';
import { ConfirmAction } from '@/components/confirm-action';
import { Select } from '@/components/ui/select';
import { useToast } from '@/components/ui/toast';
import { roleLabels, roleNames } from '@/lib/permissions';
import { reachAction } from '@/lib/reach-action';
import { changeRoleAction, removeMemberAction } from '../actions';

export function MemberRoleSelect({ memberId, role, name, disabled }: { memberId: string; role: string; name: string; disabled: boolean }) {
  const toast = useToast();
  const [value, setValue] = useState(role);
  const [busy, setBusy] = useState(false);
  return (
    <Select
      label={`Role of ${name}`}
      hideLabel
      value={value}
      disabled={disabled || busy}
      options={roleNames.map((r) => ({ value: r, label: roleLabels[r] }))}
      onChange={async (event) => {
        const next = event.target.value;
        setBusy(true);
        const result = await reachAction(() => changeRoleAction({ memberId, role: next }));
        setBusy(false);
        if (result.ok) setValue(next);
        toast(result.message, result.ok ? 'success' : 'error');
      }}
    />
  );
}

export function RemoveMemberButton({ memberId, name }: { memberId: string; name: string }) {
  const toast = useToast();
  return (
    <ConfirmAction
      label="Remove"
      ariaLabel={`Remove ${name}`}
      title={`Remove ${name}?`}
      onConfirm={async () => {
        const result = await reachAction(() => removeMemberAction(memberId));
        toast(result.message, result.ok ? 'success' : 'error');
      }}
    >
      They will lose access to the organisation at once. Their past actions stay in the audit log.
    </ConfirmAction>
  );
}
