'use client';

import { useEffect, useRef, useState } from 'react';

/**
 * The rendered width of a container, kept current as it resizes, so SVG charts fit any screen.
 * Never below `minimum`: a chart whose layout needs more overflows its container rather than
 * squeezing its marks (a chart that rearranges itself on a phone passes a smaller minimum).
 */
export function useWidth<T extends HTMLElement>(fallback = 720, minimum = 320) {
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
