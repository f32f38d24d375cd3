'use client';

import { useEffect, useRef, useState } from 'react';

/**
 * Charts are never drawn narrower than this, under which their marks would be squeezed: what a
 * card leaves on a 320 px phone. (At 320 the charts ran 10 px past their cards on a 360 px phone.)
 */
const MIN_WIDTH = 240;

/** The rendered width of a container, kept current as it resizes, so SVG charts fit any screen. */
export function useWidth<T extends HTMLElement>(fallback = 720) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) setWidth(Math.max(MIN_WIDTH, Math.floor(entry.contentRect.width)));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}
