'use client';

import { useEffect, useId, useRef, type ReactNode } from 'react';

export interface DialogProps {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  /** 'wide' for dialogs that show a table. */
  size?: 'normal' | 'wide';
}

/**
 * A modal built on the native <dialog>: focus is trapped and restored, Escape closes it, and
 * the page behind is inert, all by the browser. Its title names it: an id of its own, since a page
 * holds several (a project's page has four, which all took the first one's name).
 */
export function Dialog({ open, title, onClose, children, size = 'normal' }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-labelledby={titleId}
      className={`m-auto w-full ${size === 'wide' ? 'max-w-5xl' : 'max-w-md'} rounded-card border border-line bg-paper-raised p-6 text-ink shadow-card backdrop:bg-ink/40`}
    >
      <h2 id={titleId} className="mb-4">
        {title}
      </h2>
      {children}
    </dialog>
  );
}
