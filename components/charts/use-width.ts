'use client';

import { useEffect, useRef, useState } from 'react';

/**
 * The rendered width of a container, kept current as it resizes, so SVG charts fit any screen.
 * Never below `minimum`, under which a chart would squeeze its marks: 240 px, what a card leaves
 * on a 320 px phone. (A minimum of 320 pushed the charts 10 px past their cards at 360 px, the
 * commonest phone width.)
 */
export function useWidth<T extends HTMLElement>(fallback = 720, minimum = 240) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) setWidth(Math.max(minimum, Math.floor(entry.contentRect.width)));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [minimum]);
  return { ref, width };
}
