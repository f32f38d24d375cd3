'use client';

import { FormProblem } from '@/components/form-problem';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { authClient } from '@/lib/auth-client';

export function AcceptInvitation({ invitationId }: { invitationId: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const accept = async () => {
    setBusy(true);
    setProblem(null);
    const { data, error } = await authClient.organization.acceptInvitation({ invitationId });
    if (error || !data) {
      setBusy(false);
      return setProblem(error?.message ?? 'Accepting the invitation did not work. Please try again.');
    }
    await authClient.organization.setActive({ organizationId: data.invitation.organizationId });
    router.push('/portfolio');
    router.refresh();
  };
  return (
    <div className="mt-6 flex flex-col gap-3">
      <FormProblem message={problem} />
      <Button onClick={accept} busy={busy}>
        Accept and continue
      </Button>
    </div>
  );
}
