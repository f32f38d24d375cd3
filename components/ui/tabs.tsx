'use client';

import { useId, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';

export interface Tab {
  id: string;
  label: string;
  content: ReactNode;
  /** Render the content only once the tab has been opened (for a panel that fetches or computes on mount). */
  lazy?: boolean;
}

/** Tabs with the WAI-ARIA keyboard model: arrow keys move between tabs, Home and End jump. */
export function Tabs({ tabs, initial }: { tabs: Tab[]; initial?: string }) {
  const [active, setActiveState] = useState(initial ?? tabs[0]?.id);
  const [opened, setOpened] = useState(() => new Set([initial ?? tabs[0]?.id]));
  const setActive = (id: string | undefined) => {
    setActiveState(id);
    if (id !== undefined && !opened.has(id)) setOpened(new Set([...opened, id]));
  };
  const base = useId();
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const onKey = (event: KeyboardEvent, index: number) => {
    const last = tabs.length - 1;
    const next =
      event.key === 'ArrowRight'
        ? index === last
          ? 0
          : index + 1
        : event.key === 'ArrowLeft'
          ? index === 0
            ? last
            : index - 1
          : event.key === 'Home'
            ? 0
            : event.key === 'End'
              ? last
              : -1;
    if (next < 0) return;
    event.preventDefault();
    setActive(tabs[next]!.id);
    refs.current[next]?.focus();
  };
  return (
    <div>
      <div role="tablist" className="flex gap-1 border-b border-line">
        {tabs.map((tab, index) => (
          <button
            key={tab.id}
            ref={(el) => {
              refs.current[index] = el;
            }}
            role="tab"
            id={`${base}-tab-${tab.id}`}
            aria-selected={active === tab.id}
            aria-controls={`${base}-panel-${tab.id}`}
            tabIndex={active === tab.id ? 0 : -1}
            onClick={() => setActive(tab.id)}
            onKeyDown={(e) => onKey(e, index)}
            className={`-mb-px border-b-2 px-4 py-2 text-body ${active === tab.id ? 'border-tide-500 font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
          >
            {tab.label}
          </button>
        ))}
      </div>
      {tabs.map((tab) => (
        <div key={tab.id} role="tabpanel" id={`${base}-panel-${tab.id}`} aria-labelledby={`${base}-tab-${tab.id}`} hidden={active !== tab.id} className="pt-4">
          {!tab.lazy || opened.has(tab.id) ? tab.content : null}
        </div>
      ))}
    </div>
  );
}
