'use client';

import { Button } from '@/components/ui/button';

export default function AppError({ reset }: { error: Error; reset: () => void }) {
  return (
    <section role="alert" className="mx-auto max-w-lg py-16 text-center">
      <h1>This page could not be shown</h1>
      <p className="mt-3 text-ink-soft">Nothing you saved has been lost. Please try again; if it keeps happening, tell your Leeway admin.</p>
      <Button className="mt-6" onClick={reset}>
        Try again
      </Button>
    </section>
  );
}
