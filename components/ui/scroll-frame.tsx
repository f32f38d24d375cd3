'use client';

import { useEffect, useRef, useState, type ReactNode } from 'react';

/**
 * A frame that scrolls sideways when its content is wider than it (a table on a phone). While it
 * does, it is a named region the keyboard can reach, so its hidden columns can be scrolled into
 * view with the arrow keys (WCAG 2.1.1); while everything fits, it is no extra tab stop.
 */
export function ScrollFrame({ label, className, children }: { label: string; className: string; children: ReactNode }) {
  const ref = useRef<HTMLDivElement>(null);
  const [scrolls, setScrolls] = useState(false);
  useEffect(() => {
    const frame = ref.current;
    if (!frame) return;
    const measure = () => setScrolls(frame.scrollWidth > frame.clientWidth + 1);
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(frame);
    if (frame.firstElementChild) observer.observe(frame.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return (
    <div ref={ref} className={className} {...(scrolls ? { tabIndex: 0, role: 'region', 'aria-label': `${label}, scrolls sideways` } : {})}>
      {children}
    </div>
  );
}
