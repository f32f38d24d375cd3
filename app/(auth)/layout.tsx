import type { ReactNode } from 'react';
import { Wordmark } from '@/components/wordmark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="flex min-h-screen flex-col items-center justify-center px-4 py-12">
      <div className="mb-8">
        <Wordmark />
      </div>
      <div className="w-full max-w-md rounded-card border border-line bg-paper-raised p-8 shadow-card">{children}</div>
      <p className="mt-6 max-w-md text-center text-caption text-ink-muted">
        Leeway values the flexibility inside capital projects: defer, expand, contract, abandon, stage and switch.
      </p>
    </main>
  );
}
