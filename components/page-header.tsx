import type { ReactNode } from 'react';

export function PageHeader({ title, lead, actions }: { title: string; lead?: string; actions?: ReactNode }) {
  return (
    <header className="mb-8 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1>{title}</h1>
        {lead ? <p className="mt-1 max-w-2xl text-lead text-ink-soft">{lead}</p> : null}
      </div>
      {actions}
    </header>
  );
}
