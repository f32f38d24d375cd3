'use client';

import { useState } from 'react';
import { Button } from './ui/button';

/** Copies a text to the clipboard, and says so (or says to copy by hand when the browser refuses). */
export function CopyButton({ text, label }: { text: string; label: string }) {
  const [state, setState] = useState<'idle' | 'copied' | 'refused'>('idle');
  return (
    <Button
      variant="quiet"
      aria-label={label}
      onClick={() =>
        navigator.clipboard.writeText(text).then(
          () => setState('copied'),
          () => setState('refused'),
        )
      }
    >
      <span aria-live="polite">{state === 'copied' ? 'Copied' : state === 'refused' ? 'Select and copy by hand' : 'Copy'}</span>
    </Button>
  );
}
