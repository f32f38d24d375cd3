'use client';

import { useLayoutEffect, useRef, useState } from 'react';

/**
 * Charts are never drawn narrower than this, under which their marks would be squeezed: what a
 * card leaves on a 320 px phone. (At 320 the charts ran 10 px past their cards on a 360 px phone.)
 */
const MIN_WIDTH = 240;

const fitted = (width: number) => Math.max(MIN_WIDTH, Math.floor(width));

/** The rendered width of a container, kept current as it resizes, so SVG charts fit any screen. */
export function useWidth<T extends HTMLElement>(fallback = 720) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  // Measured in a layout effect, before the browser paints: a ResizeObserver alone reports after
  // the first paint, so a chart mounted once its figures arrived was drawn at the fallback width
  // for a frame, 720 px on a 360 px phone (a CI run caught the boundary chart that way).
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    setWidth(fitted(el.getBoundingClientRect().width - horizontalPadding(el)));
    const observer = new ResizeObserver(([entry]) => {
      if (entry) setWidth(fitted(entry.contentRect.width));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

/** The padding a ResizeObserver's content box leaves out, so both measures agree. */
function horizontalPadding(el: HTMLElement) {
  const style = getComputedStyle(el);
  return parseFloat(style.paddingLeft) + parseFloat(style.paddingRight) + parseFloat(style.borderLeftWidth) + parseFloat(style.borderRightWidth);
}
