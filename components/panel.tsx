import type { ReactNode } from 'react';

/** A titled card of the case editor and other detail pages, with an optional line saying what it shows. */
export function Panel({ title, note, children }: { title: string; note?: string; children: ReactNode }) {
  return (
    <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 className="text-body font-semibold">{title}</h3>
      {note ? <p className="mb-3 text-caption text-ink-muted">{note}</p> : <div className="mb-3" />}
      {children}
    </section>
  );
}
