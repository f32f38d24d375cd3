/**
 * Where each approved right stands on a date, for an observed project value V. The exercise
 * boundary V*(t) of a right depends on the date, not on today's V (the model's value follows a
 * lognormal walk whatever it starts from), so the critical value at date t is read from the
 * approved run's own boundary, interpolated between its steps; the window comes from the right's
 * template. Distances: the move V must make to reach the boundary, as a fraction of V and in
 * standard deviations of ln V over the next year (σ).
 */
import { templateIds, type BoundaryPoint, type ExerciseWindow, type OptionTemplate, type RightResult } from '@/lattice';

export type RightStatus = 'in_region' | 'near' | 'outside' | 'window_not_open' | 'window_closed' | 'exercised' | 'declined';

export interface RightWatch {
  id: string;
  name: string;
  status: RightStatus;
  critical: number | null;
  side: BoundaryPoint['side'] | null;
  /** critical ÷ V − 1: how far V must move (positive: up) to reach the boundary. */
  distanceRatio: number | null;
  /** ln(critical ÷ V) ÷ σ: the same move in standard deviations of ln V over a year. */
  distanceSd: number | null;
  /** Years after the valuation date; null when it does not apply. */
  windowOpensAt: number | null;
  windowClosesAt: number | null;
}

/** The dates (in years) the right can be used on, as the next opening and the last closing from t. */
function windowAt(o: OptionTemplate, horizon: number, t: number): { open: boolean; opensAt: number | null; closesAt: number | null } {
  const window: ExerciseWindow | undefined =
    o.kind === 'stage' ? { kind: 'bermudan', dates: o.payments.map((p) => p.at) } : o.kind === 'mothball' ? o.window : o.window;
  if (!window) return { open: true, opensAt: 0, closesAt: horizon };
  if (window.kind === 'american') return { open: window.from <= t && t <= window.to, opensAt: window.from, closesAt: window.to };
  const dates = window.kind === 'european' ? [window.at] : [...window.dates].sort((a, b) => a - b);
  const next = dates.find((d) => d >= t - 1e-9) ?? null;
  return { open: next !== null && Math.abs(next - t) < 1e-9, opensAt: next, closesAt: dates.at(-1)! };
}

/** The boundary at date t, interpolated between the two steps around it; null where the right is not used near t. */
export function boundaryAt(
  points: BoundaryPoint[],
  t: number,
): { critical: number | null; side: BoundaryPoint['side']; low: number | null; high: number | null } | null {
  if (points.length === 0) return null;
  const spacing = points.length > 1 ? Math.min(...points.slice(1).map((p, k) => p.t - points[k]!.t)) : Infinity;
  const exact = points.find((p) => Math.abs(p.t - t) < 1e-9);
  // The valuation date has one node, so a right used there is used "anywhere" with no critical
  // value; the next step, if the right is used there too, locates the boundary it stands for.
  const next = exact && exact.t < 1e-9 && exact.side === 'anywhere' ? points.find((p) => p.t > 1e-9) : undefined;
  if (next && next.t <= 1.5 * spacing && next.critical !== null) return next;
  if (exact) return exact;
  const after = points.findIndex((p) => p.t > t);
  // Before the first step where it is used, by less than a step: the lattice cannot locate a
  // boundary at a date with one node (the valuation date), so the next step's stands for it.
  if (after === 0) return points[0]!.t - t <= 1.5 * spacing ? points[0]! : null;
  if (after < 0) return null;
  const a = points[after - 1]!;
  const b = points[after]!;
  // Two steps apart or more: the right is not used between them, so not at t either.
  if (b.t - a.t > 1.5 * spacing || a.side !== b.side) return null;
  const w = (t - a.t) / (b.t - a.t);
  const mix = (x: number | null, y: number | null) => (x === null || y === null ? null : x + w * (y - x));
  return { critical: mix(a.critical, b.critical), side: a.side, low: mix(a.low, b.low), high: mix(a.high, b.high) };
}

export function rightStatuses(args: {
  options: OptionTemplate[];
  rights: RightResult[];
  horizon: number;
  volatility: number;
  t: number;
  value: number;
}): RightWatch[] {
  const { options, rights, horizon, volatility, t, value } = args;
  const ids = templateIds(options);
  return options.map((o, k) => {
    const id = ids[k]!;
    const right = rights.find((s) => s.id === id);
    const window = windowAt(o, horizon, t);
    const base = { id, name: o.id ?? id, windowOpensAt: window.opensAt, windowClosesAt: window.closesAt };
    const none = { critical: null, side: null, distanceRatio: null, distanceSd: null };
    if (window.opensAt === null || t > (window.closesAt ?? horizon) + 1e-9) return { ...base, ...none, status: 'window_closed' as const };
    // Not open today: where the boundary will stand when it opens.
    const at = boundaryAt(right?.boundary ?? [], window.open ? t : Math.max(t, window.opensAt));
    const critical = at?.critical ?? null;
    const distanceRatio = critical === null ? null : critical / value - 1;
    const distanceSd = critical === null ? null : Math.log(critical / value) / volatility;
    const figures = { critical, side: at?.side ?? null, distanceRatio, distanceSd };
    if (!window.open) return { ...base, ...figures, status: 'window_not_open' as const };
    if (!at) return { ...base, ...figures, status: 'outside' as const };
    const inside =
      at.side === 'anywhere' ||
      (at.side === 'above' && value >= at.critical!) ||
      (at.side === 'below' && value <= at.critical!) ||
      (at.side === 'between' && value >= (at.low ?? -Infinity) && value <= (at.high ?? Infinity));
    const status: RightStatus = inside ? 'in_region' : distanceSd !== null && Math.abs(distanceSd) <= 1 ? 'near' : 'outside';
    return { ...base, ...figures, status };
  });
}
