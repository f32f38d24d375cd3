'use client';

import { useRouter } from 'next/navigation';
import { ConfirmAction } from '@/components/confirm-action';
import { useToast } from '@/components/ui/toast';
import { ApiError, sendJson } from '@/lib/api-client';

export function RevokeKeyButton({ keyId, name }: { keyId: string; name: string }) {
  const toast = useToast();
  const router = useRouter();
  return (
    <ConfirmAction
      label="Revoke"
      ariaLabel={`Revoke the key ${name}`}
      title={`Revoke the key “${name}”?`}
      onConfirm={async () => {
        try {
          await sendJson('DELETE', `/api/v1/api-keys/${keyId}`);
          toast(`The key “${name}” is revoked.`, 'success');
          router.refresh();
        } catch (error) {
          toast(error instanceof ApiError ? error.message : 'The key could not be revoked; try again.', 'error');
        }
      }}
    >
      Every system using it is refused from the next request on. What it wrote stays in the audit log.
    </ConfirmAction>
  );
}
