/**
 * Exercise windows snapped to the lattice's steps.
 *
 * A single decision date (Bermudan, European) snaps to the nearest step (i = round(t/Δt)). An
 * American window keeps the steps inside it: its start snaps up and its end down, so the lattice
 * never uses a right on a date the window does not allow. Rounding the end outward let the
 * demo plant's sale, open to year 7, be used at 7.04 at 100 steps, after part of the last
 * year's payout: that moved the Phase 2 boundary down by 2–3 % at every step count whose steps
 * split the years (docs/engine.md §2). A window with no step inside it gets the one step
 * nearest its middle. Every snap that moves a date by more than 1e-9 years is reported so the
 * user knows the lattice decided at 2.0 and not 1.9.
 */
import type { ExerciseWindow } from './schema';
import type { Years } from './units';

export interface Snap {
  field: string;
  requested: Years;
  used: Years;
}

const SNAP_REPORT_THRESHOLD = 1e-9;

/** A step within 1e-9 of a step count is on it (t/Δt carries rounding error). */
const ON_STEP = 1e-9;

/** The step a date snaps to: the nearest, the first at or after it, or the last at or before it. */
export function snapToStep(t: Years, dt: Years, steps: number, toward: 'nearest' | 'later' | 'earlier' = 'nearest'): number {
  const x = t / dt;
  const index = toward === 'later' ? Math.ceil(x - ON_STEP) : toward === 'earlier' ? Math.floor(x + ON_STEP) : Math.round(x);
  return Math.min(steps, Math.max(0, index));
}

function report(index: number, t: Years, dt: Years, field: string, snaps: Snap[]): number {
  const used = index * dt;
  if (Math.abs(used - t) > SNAP_REPORT_THRESHOLD) snaps.push({ field, requested: t, used });
  return index;
}

function snapIndex(t: Years, dt: Years, steps: number, field: string, snaps: Snap[]): number {
  return report(snapToStep(t, dt, steps), t, dt, field, snaps);
}

/** Marks the steps at which a window is open (1) in a mask of length steps + 1. */
export function openSteps(window: ExerciseWindow, dt: Years, steps: number, field: string, snaps: Snap[]): Uint8Array {
  const mask = new Uint8Array(steps + 1);
  switch (window.kind) {
    case 'american': {
      let from = snapToStep(window.from, dt, steps, 'later');
      let to = snapToStep(window.to, dt, steps, 'earlier');
      if (from > to) from = to = snapToStep((window.from + window.to) / 2, dt, steps);
      report(from, window.from, dt, `${field}.from`, snaps);
      report(to, window.to, dt, `${field}.to`, snaps);
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

/** The window of one date, today. */
export const TODAY: ExerciseWindow = { kind: 'european', at: 0 };

/** The first step a window opens (every window opens at least one step). */
export function firstOpenStep(window: ExerciseWindow, dt: Years, steps: number): number {
  return openSteps(window, dt, steps, 'window', []).indexOf(1);
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
