'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { useToast } from '@/components/ui/toast';
import { ApiError, sendJson } from '@/lib/api-client';

export function RevokeKeyButton({ keyId, name }: { keyId: string; name: string }) {
  const toast = useToast();
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <Button variant="quiet" onClick={() => setOpen(true)} aria-label={`Revoke the key ${name}`}>
        Revoke
      </Button>
      <Dialog open={open} title={`Revoke the key “${name}”?`} onClose={() => setOpen(false)}>
        <p className="text-ink-soft">Every system using it is refused from the next request on. What it wrote stays in the audit log.</p>
        <div className="mt-6 flex justify-end gap-3">
          <Button variant="secondary" onClick={() => setOpen(false)}>
            Keep
          </Button>
          <Button
            variant="danger"
            busy={busy}
            onClick={async () => {
              setBusy(true);
              try {
                await sendJson('DELETE', `/api/v1/api-keys/${keyId}`);
                toast(`The key “${name}” is revoked.`, 'success');
                router.refresh();
              } catch (error) {
                toast(error instanceof ApiError ? error.message : 'The key could not be revoked; try again.', 'error');
              } finally {
                setBusy(false);
                setOpen(false);
              }
            }}
          >
            Revoke
          </Button>
        </div>
      </Dialog>
    </>
  );
}
