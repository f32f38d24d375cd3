import type { ReactNode } from 'react';

export function EmptyState({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="rounded-card border border-dashed border-line-strong bg-paper-raised px-8 py-12 text-center">
      <h2>{title}</h2>
      <div className="mx-auto mt-2 max-w-md text-ink-soft">{children}</div>
    </div>
  );
}
