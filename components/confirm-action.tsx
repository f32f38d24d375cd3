'use client';

import { useState, type ReactNode } from 'react';
import { Button } from './ui/button';
import { Dialog } from './ui/dialog';

/**
 * A quiet button that asks before it does something that cannot be undone: a dialog says what
 * happens, "Keep" closes it, the danger button runs `onConfirm` (busy meanwhile) and closes it.
 */
export function ConfirmAction({
  label,
  ariaLabel,
  title,
  children,
  onConfirm,
}: {
  label: string;
  ariaLabel: string;
  title: string;
  children: ReactNode;
  onConfirm: () => Promise<void>;
}) {
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <Button variant="quiet" onClick={() => setOpen(true)} aria-label={ariaLabel}>
        {label}
      </Button>
      <Dialog open={open} title={title} onClose={() => setOpen(false)}>
        <p className="text-ink-soft">{children}</p>
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
                await onConfirm();
              } finally {
                setBusy(false);
                setOpen(false);
              }
            }}
          >
            {label}
          </Button>
        </div>
      </Dialog>
    </>
  );
}
