'use client';

import { Button } from '@/components/ui/button';

export default function AuthError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert">
      <h1>Something went wrong</h1>
      <p className="mt-2 text-ink-soft">Please try again. If it keeps happening, contact your Leeway admin.</p>
      <Button variant="quiet" className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
