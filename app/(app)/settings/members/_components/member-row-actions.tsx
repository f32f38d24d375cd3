'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Select } from '@/components/ui/select';
import { useToast } from '@/components/ui/toast';
import { roleLabels, roleNames } from '@/lib/permissions';
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
        const result = await changeRoleAction({ memberId, role: next });
        setBusy(false);
        if (result.ok) setValue(next);
        toast(result.message, result.ok ? 'success' : 'error');
      }}
    />
  );
}

export function RemoveMemberButton({ memberId, name }: { memberId: string; name: string }) {
  const toast = useToast();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <Button variant="quiet" onClick={() => setOpen(true)} aria-label={`Remove ${name}`}>
        Remove
      </Button>
      <Dialog open={open} title={`Remove ${name}?`} onClose={() => setOpen(false)}>
        <p className="text-ink-soft">They will lose access to the organisation at once. Their past actions stay in the audit log.</p>
        <div className="mt-6 flex justify-end gap-3">
          <Button variant="secondary" onClick={() => setOpen(false)}>
            Keep
          </Button>
          <Button
            variant="danger"
            busy={busy}
            onClick={async () => {
              setBusy(true);
              const result = await removeMemberAction(memberId);
              setBusy(false);
              setOpen(false);
              toast(result.message, result.ok ? 'success' : 'error');
            }}
          >
            Remove
          </Button>
        </div>
      </Dialog>
    </>
  );
}
