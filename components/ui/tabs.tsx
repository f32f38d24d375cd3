'use client';

import { useId, useRef, useState, type KeyboardEvent, type MouseEvent, type ReactNode } from 'react';

export interface Tab {
  id: string;
  label: string;
  content: ReactNode;
  /** Render the content only once the tab has been opened (for a panel that fetches or computes on mount). */
  lazy?: boolean;
}

/** The address of a tab: the page's own, with `?tab=` naming it (the page reads it to open that tab). */
const tabHref = (id: string) => `?tab=${encodeURIComponent(id)}`;

/**
 * Tabs with the WAI-ARIA keyboard model: arrow keys move between tabs, Home and End jump.
 * Each tab is a link to the page with that tab open. Once the page's script runs, a click
 * switches in place and only rewrites the address (so a reload or a shared address opens the
 * same tab); a click before then, on a slow machine, still opens the tab by loading its address,
 * where a button would have done nothing.
 */
export function Tabs({ tabs, initial }: { tabs: Tab[]; initial?: string }) {
  // An address may name a tab that is not there (an old link, a typo): the first tab opens then.
  const first = tabs.find((tab) => tab.id === initial)?.id ?? tabs[0]?.id;
  const [active, setActiveState] = useState(first);
  const [opened, setOpened] = useState(() => new Set([first]));
  const setActive = (id: string) => {
    setActiveState(id);
    if (!opened.has(id)) setOpened(new Set([...opened, id]));
    // The same address as the tab's link, so a click before or after the script leaves the same one.
    window.history.replaceState(window.history.state, '', tabHref(id));
  };
  const base = useId();
  const refs = useRef<(HTMLAnchorElement | null)[]>([]);
  const onClick = (event: MouseEvent, id: string) => {
    // A new window or tab (modifier keys, middle button) keeps the link's own behaviour.
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    setActive(id);
  };
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
              : event.key === ' '
                ? index
                : -1;
    if (next < 0) return;
    event.preventDefault();
    setActive(tabs[next]!.id);
    refs.current[next]?.focus();
  };
  return (
    <div>
      <div role="tablist" className="flex flex-wrap gap-1 border-b border-line">
        {tabs.map((tab, index) => (
          <a
            key={tab.id}
            ref={(el) => {
              refs.current[index] = el;
            }}
            href={tabHref(tab.id)}
            role="tab"
            id={`${base}-tab-${tab.id}`}
            aria-selected={active === tab.id}
            aria-controls={`${base}-panel-${tab.id}`}
            tabIndex={active === tab.id ? 0 : -1}
            onClick={(e) => onClick(e, tab.id)}
            onKeyDown={(e) => onKey(e, index)}
            className={`-mb-px border-b-2 px-4 py-2 text-body ${active === tab.id ? 'border-tide-500 font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
          >
            {tab.label}
          </a>
        ))}
      </div>
      {tabs.map((tab) => (
        <div key={tab.id} role="tabpanel" id={`${base}-panel-${tab.id}`} aria-labelledby={`${base}-tab-${tab.id}`} hidden={active !== tab.id} className="pt-4">
          {/* The panel's heading, for those who move by headings: its sections are h3s under it. */}
          <h2 className="sr-only">{tab.label}</h2>
          {!tab.lazy || opened.has(tab.id) ? tab.content : null}
        </div>
      ))}
    </div>
  );
}
