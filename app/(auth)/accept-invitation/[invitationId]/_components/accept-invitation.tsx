'use client';

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
      {problem ? (
        <p role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-brick-700">
          {problem}
        </p>
      ) : null}
      <Button onClick={accept} busy={busy}>
        Accept and continue
      </Button>
    </div>
  );
}
