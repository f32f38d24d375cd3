/**
 * Exercise windows snapped to the lattice's steps.
 *
 * Decision dates snap to the nearest step (i = round(t/Δt)); every snap that moves a date by
 * more than 1e-9 years is reported so the user knows the lattice decided at 2.0 and not 1.9.
 */
import type { ExerciseWindow } from './schema';
import type { Years } from './units';

export interface Snap {
  field: string;
  requested: Years;
  used: Years;
}

const SNAP_REPORT_THRESHOLD = 1e-9;

function snapIndex(t: Years, dt: Years, steps: number, field: string, snaps: Snap[]): number {
  const index = Math.min(steps, Math.max(0, Math.round(t / dt)));
  const used = index * dt;
  if (Math.abs(used - t) > SNAP_REPORT_THRESHOLD) snaps.push({ field, requested: t, used });
  return index;
}

/** Marks the steps at which a window is open (1) in a mask of length steps + 1. */
export function openSteps(window: ExerciseWindow, dt: Years, steps: number, field: string, snaps: Snap[]): Uint8Array {
  const mask = new Uint8Array(steps + 1);
  switch (window.kind) {
    case 'american': {
      const from = snapIndex(window.from, dt, steps, `${field}.from`, snaps);
      const to = snapIndex(window.to, dt, steps, `${field}.to`, snaps);
      for (let i = from; i <= to; i++) mask[i] = 1;
      return mask;
    }
    case 'bermudan':
      window.dates.forEach((date, k) => {
        mask[snapIndex(date, dt, steps, `${field}.dates[${k}]`, snaps)] = 1;
      });
      return mask;
    case 'european':
      mask[snapIndex(window.at, dt, steps, `${field}.at`, snaps)] = 1;
      return mask;
    default: {
      const unreachable: never = window;
      return unreachable;
    }
  }
}

/** The latest time a window can be exercised (to check it lies inside the horizon). */
export function windowEnd(window: ExerciseWindow): Years {
  switch (window.kind) {
    case 'american':
      return window.to;
    case 'bermudan':
      return Math.max(...window.dates);
    case 'european':
      return window.at;
    default: {
      const unreachable: never = window;
      return unreachable;
    }
  }
}

/** The earliest time a window can be exercised. */
export function windowStart(window: ExerciseWindow): Years {
  switch (window.kind) {
    case 'american':
      return window.from;
    case 'bermudan':
      return Math.min(...window.dates);
    case 'european':
      return window.at;
    default: {
      const unreachable: never = window;
      return unreachable;
    }
  }
}
