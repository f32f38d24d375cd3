'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useToast } from '@/components/ui/toast';
import { useInteractive } from '@/components/ui/use-interactive';
import { authClient, noAnswer } from '@/lib/auth-client';

export function SignOutButton() {
  const router = useRouter();
  const toast = useToast();
  const [busy, setBusy] = useState(false);
  const interactive = useInteractive();
  return (
    <button
      type="button"
      disabled={busy || !interactive}
      className="text-body text-ink-soft underline hover:text-ink disabled:cursor-not-allowed disabled:text-ink-muted"
      onClick={async () => {
        setBusy(true);
        const { error } = await authClient.signOut();
        // The server never heard it: still signed in, so say so rather than show the sign-in page
        // over a live session. Any answer (a session already gone is refused 400) ends it here.
        if (noAnswer(error)) {
          setBusy(false);
          return toast(error.message, 'error');
        }
        router.push('/sign-in');
        router.refresh();
      }}
    >
      Sign out
    </button>
  );
}
