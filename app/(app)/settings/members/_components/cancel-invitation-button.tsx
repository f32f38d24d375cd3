'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';
import { reachAction } from '@/lib/reach-action';
import { cancelInvitationAction } from '../actions';

export function CancelInvitationButton({ invitationId, email }: { invitationId: string; email: string }) {
  const toast = useToast();
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant="quiet"
      busy={busy}
      aria-label={`Cancel the invitation to ${email}`}
      onClick={async () => {
        setBusy(true);
        const result = await reachAction(() => cancelInvitationAction(invitationId));
        setBusy(false);
        toast(result.message, result.ok ? 'success' : 'error');
      }}
    >
      Cancel
    </Button>
  );
}
