/**
 * Following an approved case: record what the project is worth now and what the team decided,
 * and say where each right stands. The model followed is the latest approved snapshot; its
 * valuation date is the day it was approved, and dates become years after it at 365.25 days a
 * year (the lattice's unit).
 */
import 'server-only';
import type { Transaction } from 'kysely';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addObservation, listFollowedSnapshots, listObservations } from '@/db/queries/observations';
import { addRightDecision, listRightDecisions, type RightDecisionRow } from '@/db/queries/right-decisions';
import { latestApprovedSnapshot, previousApprovedSnapshot } from '@/db/queries/reviews';
import { listAlerts } from '@/db/queries/watch-alerts';
import type { CaseSnapshot, DB } from '@/db/types';
import { templateIds, type ProjectModel, type ValuationResult } from '@/lattice';
import { requireCase } from '../cases/require-case';
import type { Member } from '../dal';
import { valueInWorker } from '../engine/pool';
import { AppError } from '../errors';
import { enqueue } from '../jobs/enqueue';
import { QUEUES } from '../jobs/queues';
import type { ObservationInput } from '../validations/observation';
import type { PlacedPoint } from '../volatility/read-series';
import type { RightDecisionInput } from '../validations/right-decision';
import { ClockError, modelAt, type UsedRights } from './clock';
import { dateAfter, dateOf, yearsBetween } from './dates';
import { rightStatuses, type RightWatch } from './status';
import { readStoredModel, readStoredResult } from '@/lattice';

/** Where each right stands by the approved run's boundary alone (lib/watch/status.ts). */
function boundaryReading(model: ProjectModel, result: ValuationResult, t: number, value: number): RightWatch[] {
  return rightStatuses({ options: model.options ?? [], rights: result.rights, horizon: model.horizon, volatility: model.underlying.volatility, t, value });
}

/** A followed version with what is known of it since: observations and decisions. */
export interface Followed {
  snapshot: CaseSnapshot;
  valuationDate: string;
  model: ProjectModel;
  result: ValuationResult;
  observations: Awaited<ReturnType<typeof listObservations>>;
  decisions: RightDecisionRow[];
}

/**
 * Where the project stands today: the clock has moved to today (a window that closed since the
 * last observation is closed), V is the latest value observed (V₀ before any, dated `valueOn`),
 * the rights used or given up, and whether the project has ended (an abandonment used, or a
 * stage payment declined). Nothing is recorded in the future, so today is the latest date known.
 */
export function positionOf(f: Followed, today = dateOf(new Date())) {
  const latest = f.observations.at(-1);
  const dates = [today, f.valuationDate, latest?.observedOn ?? f.valuationDate, ...f.decisions.map((d) => d.decidedOn)];
  const asOf = dates.reduce((a, b) => (b > a ? b : a));
  const used: UsedRights = { exercised: [], declined: [] };
  const recorded = new Map<string, 'exercised' | 'declined'>();
  for (const d of f.decisions) {
    if (d.decision === 'postponed') continue;
    used[d.decision].push(d.rightId);
    recorded.set(d.rightId, d.decision);
  }
  const options = f.model.options ?? [];
  const ids = templateIds(options);
  const ended = options.some((o, k) => (o.kind === 'abandon' && used.exercised.includes(ids[k]!)) || (o.kind === 'stage' && used.declined.includes(ids[k]!)));
  const valueOn = latest?.observedOn ?? f.valuationDate;
  return { asOf, t: yearsBetween(f.valuationDate, asOf), value: latest?.value ?? f.model.underlying.value, valueOn, used, recorded, ended };
}

type Position = ReturnType<typeof positionOf>;

interface Standing {
  revaluedExpandedNpv: number | null;
  rights: RightWatch[];
}

const closedRight = (r: RightWatch): RightWatch => ({ ...r, status: 'window_closed', critical: null, side: null, distanceRatio: null, distanceSd: null });

/**
 * Where each right stands at the position: the model's own answer there — the approved model
 * re-valued from t with V and the recorded decisions — says which right (if any) to use now, and
 * decides `in_region` (a value beyond the approved lattice's nodes at that date has no boundary
 * to read, but still has a decision). Critical values are read from the approved run's boundary,
 * or, once a right has been exercised and the mode has changed, from the re-valued run's own
 * boundary out of its starting mode.
 */
async function standing(f: Followed, at: Position, run: { owner: string; signal?: AbortSignal }): Promise<Standing> {
  const { model, result } = f;
  const { t, value, used, recorded, ended } = at;
  const approved = boundaryReading(model, result, t, value);
  const decided = (rights: RightWatch[]) =>
    rights.map((r): RightWatch => {
      const d = recorded.get(r.id);
      return d ? { ...closedRight(r), status: d } : r;
    });
  if (ended) return { revaluedExpandedNpv: 0, rights: decided(approved.map(closedRight)) };
  let clock;
  let now: ValuationResult;
  try {
    clock = modelAt(model, t, value, used);
    now = await valueInWorker(clock.model, { extras: false, grid: { steps: 0 }, paths: used.exercised.length > 0 }, run);
  } catch (error) {
    if (error instanceof ClockError) return { revaluedExpandedNpv: null, rights: decided(approved) };
    throw error;
  }
  let rights = approved;
  if (used.exercised.length > 0) {
    // The re-valued run's boundaries, from the mode the decisions made, at its own time zero.
    const fromStart = now.rights.map((s) => ({ ...s, boundary: s.paths?.find((p) => p.from === now.startMode)?.boundary ?? s.boundary }));
    const fresh = rightStatuses({
      options: clock.model.options ?? [],
      rights: fromStart,
      horizon: clock.model.horizon,
      volatility: model.underlying.volatility,
      t: 0,
      value,
    });
    const shift = (y: number | null) => (y === null ? null : y + t);
    rights = approved.map((r) => {
      const same = fresh.find((x) => x.id === r.id);
      return same ? { ...same, name: r.name, windowOpensAt: shift(same.windowOpensAt), windowClosesAt: shift(same.windowClosesAt) } : closedRight(r);
    });
  }
  const usedNow = now.grid?.steps[0]?.modes[now.startMode]?.decision[0] ?? null;
  const open = (r: RightWatch) => r.status === 'in_region' || r.status === 'near' || r.status === 'outside';
  return {
    revaluedExpandedNpv: now.expandedNpv,
    rights: decided(
      rights.map((r): RightWatch =>
        !open(r) ? r : r.id === usedNow ? { ...r, status: 'in_region' } : r.status === 'in_region' ? { ...r, status: 'near' } : r,
      ),
    ),
  };
}

export async function loadFollowed(orgId: string, caseId: string): Promise<Followed & { projectId: string }> {
  const found = await requireCase(db, orgId, caseId);
  const snapshot = await latestApprovedSnapshot(db, { orgId, caseId });
  if (!snapshot?.decided_at) throw new AppError('conflict', 'This case has no approved version to follow yet: its rights are watched from their approval.');
  const [observations, decisions] = await Promise.all([listObservations(db, { orgId, caseId }), listRightDecisions(db, { orgId, snapshotId: snapshot.id })]);
  return {
    projectId: found.project_id,
    snapshot,
    valuationDate: dateOf(snapshot.decided_at),
    model: readStoredModel(snapshot.model),
    result: readStoredResult(snapshot.result),
    observations,
    decisions,
  };
}

/** A date the followed model can be seen from: on or after approval, not in the future, before the horizon. */
function checkFollowDate(f: Followed, date: string) {
  const refuse = (message: string) => new AppError('unprocessable', message, { date: [message] });
  if (date < f.valuationDate) throw refuse(`The date is before ${f.valuationDate}, when the version followed was approved.`);
  if (date > dateOf(new Date())) throw refuse('The date is in the future: record what is known today.');
  if (yearsBetween(f.valuationDate, date) >= f.model.horizon)
    throw refuse(`The date is beyond the model's horizon (${dateAfter(f.valuationDate, f.model.horizon)}): no right is left to follow.`);
}

/**
 * The audit entry of a change to a followed case, and the check of its alerts, both in the
 * change's transaction: the check runs exactly when the change is committed.
 */
async function recordFollowChange(trx: Transaction<DB>, member: Member, caseId: string, action: string, detail: Record<string, unknown>) {
  await recordAudit(trx, { orgId: member.orgId, actorId: member.userId, action, subjectType: 'case', subjectId: caseId, detail });
  await enqueue(QUEUES.watchCheck, { orgId: member.orgId, caseId }, { executor: trx });
}

export async function recordObservation(member: Member, caseId: string, input: ObservationInput) {
  const f = await loadFollowed(member.orgId, caseId);
  checkFollowDate(f, input.date);
  return db.transaction().execute(async (trx) => {
    const made = await addObservation(trx, {
      orgId: member.orgId,
      caseId,
      observedOn: input.date,
      value: input.value,
      note: input.note,
      source: input.source,
      recordedBy: member.userId,
    });
    await recordFollowChange(trx, member, caseId, 'case.observe', { date: input.date, value: input.value, source: input.source });
    return made;
  });
}

/**
 * Records a dated series of values read from a file (lib/watch/import-observations.ts), each
 * under the rules of a single observation, all in one transaction; a refusal names its line.
 */
export async function recordObservationSeries(member: Member, caseId: string, upload: () => Promise<{ points: PlacedPoint[]; file: string }>) {
  // The case first: another organisation's case is not there (404), whatever was sent.
  const f = await loadFollowed(member.orgId, caseId);
  const { points, file } = await upload();
  for (const p of points)
    try {
      checkFollowDate(f, p.date);
    } catch (error) {
      if (!(error instanceof AppError)) throw error;
      const message = `${p.place}: ${error.message}`;
      throw new AppError('unprocessable', message, { file: [message] });
    }
  const source = `uploaded ${file}`.slice(0, 200);
  return db.transaction().execute(async (trx) => {
    for (const p of points)
      await addObservation(trx, { orgId: member.orgId, caseId, observedOn: p.date, value: p.value, note: '', source, recordedBy: member.userId });
    const dates = points.map((p) => p.date).sort();
    await recordFollowChange(trx, member, caseId, 'case.observe', { file, values: points.length, from: dates[0], to: dates.at(-1) });
    return { recorded: points.length, from: dates[0]!, to: dates.at(-1)! };
  });
}

/**
 * Records that a right was exercised, declined (given up for good) or postponed, on a date
 * (today by default). Exercised and declined are final: the right leaves the watch, and from that
 * date the watched model starts in the mode the decision made (lib/watch/clock.ts).
 */
export async function recordRightDecision(member: Member, caseId: string, rightId: string, input: RightDecisionInput) {
  const f = await loadFollowed(member.orgId, caseId);
  const ids = templateIds(f.model.options ?? []);
  if (!ids.includes(rightId)) throw new AppError('not_found', `The version followed has no right “${rightId}”. Its rights: ${ids.join(', ') || 'none'}.`);
  const date = input.date ?? dateOf(new Date());
  checkFollowDate(f, date);
  const last = f.decisions.at(-1);
  if (last && date < last.decidedOn) {
    const message = `The date is before the last decision recorded (${last.decidedOn}): decisions are recorded in the order they were made.`;
    throw new AppError('unprocessable', message, { date: [message] });
  }
  const at = positionOf(f);
  const final = at.recorded.get(rightId);
  if (final) throw new AppError('conflict', `This right was already recorded as ${final}; a final decision is not recorded twice.`);
  if (at.ended && input.decision !== 'postponed')
    throw new AppError('conflict', 'The project has ended (abandoned, or a stage payment declined): no right is left to use.');
  const option = f.model.options![ids.indexOf(rightId)]!;
  if (input.decision === 'exercised' && option.kind !== 'stage') {
    // The watched model must be able to start where the decision leaves it (e.g. an expansion
    // needs the project running): the engine's own rule, asked before anything is written.
    try {
      modelAt(f.model, yearsBetween(f.valuationDate, date), at.value, { ...at.used, exercised: [...at.used.exercised, rightId] });
    } catch (error) {
      if (error instanceof ClockError) throw new AppError('unprocessable', error.message);
      throw error;
    }
  }
  return db.transaction().execute(async (trx) => {
    const made = await addRightDecision(trx, {
      orgId: member.orgId,
      caseId,
      snapshotId: f.snapshot.id,
      rightId,
      decision: input.decision,
      decidedOn: date,
      reason: input.reason,
      recordedBy: member.userId,
    });
    await recordFollowChange(trx, member, caseId, 'case.decide_right', {
      right: rightId,
      decision: input.decision,
      date,
      reason: input.reason,
      caseVersion: f.snapshot.case_version,
    });
    return made;
  });
}

/** Where each right of a followed case stands now, with what it rests on. */
export async function readWatch(f: Followed, run: { owner: string; signal?: AbortSignal }, today?: string) {
  const at = positionOf(f, today);
  const now = await standing(f, at, run);
  const rights = now.rights.map((r) => ({
    ...r,
    windowOpensAt: r.windowOpensAt === null ? null : dateAfter(f.valuationDate, r.windowOpensAt),
    windowClosesAt: r.windowClosesAt === null ? null : dateAfter(f.valuationDate, r.windowClosesAt),
  }));
  return { asOf: at.asOf, value: at.value, valueOn: at.valueOn, rights, revaluedExpandedNpv: now.revaluedExpandedNpv };
}

export async function watchCase(member: Member, caseId: string, signal?: AbortSignal) {
  const f = await loadFollowed(member.orgId, caseId);
  const { model, result, snapshot, valuationDate } = f;
  const [now, replaced, alerts] = await Promise.all([
    readWatch(f, { owner: member.userId, signal }),
    previousApprovedSnapshot(db, { orgId: member.orgId, caseId }),
    listAlerts(db, { orgId: member.orgId, caseId, limit: 50 }),
  ]);
  return {
    followed: {
      snapshotId: snapshot.id,
      caseVersion: snapshot.case_version,
      valuationDate,
      horizon: model.horizon,
      value: model.underlying.value,
      // A later approval replaces the model followed; the one before keeps its decisions on its record.
      replaces: replaced?.decided_at ? { caseVersion: replaced.case_version, approvedOn: dateOf(replaced.decided_at) } : null,
    },
    // The approved rights with their boundaries, for the chart of observed values against them.
    boundaries: result.rights.map((s) => ({ id: s.id, kind: s.kind, exerciseProbability: s.exerciseProbability, boundary: s.boundary })),
    ...now,
    observations: f.observations,
    decisions: f.decisions,
    alerts,
  };
}

/** Every followed case of the organisation with what is known of it (for the watch list and the daily check). */
export async function listFollowed(
  orgId: string,
): Promise<(Followed & { caseId: string; caseName: string; projectId: string; projectName: string; currency: string })[]> {
  const rows = await listFollowedSnapshots(db, { orgId });
  const out = [];
  for (const row of rows) {
    if (!row.snapshot.decided_at) continue;
    const [observations, decisions] = await Promise.all([
      listObservations(db, { orgId, caseId: row.caseId }),
      listRightDecisions(db, { orgId, snapshotId: row.snapshot.id }),
    ]);
    out.push({
      ...row,
      valuationDate: dateOf(row.snapshot.decided_at),
      model: readStoredModel(row.snapshot.model),
      result: readStoredResult(row.snapshot.result),
      observations,
      decisions,
    });
  }
  return out;
}

/**
 * Every approved right across the organisation's active projects that is in its region or near
 * its boundary at its case's latest observation (or at approval): the portfolio's watch list.
 */
export async function watchList(member: Member) {
  const rows = [];
  // One case after another: the engine takes at most a few jobs per person at once, and a busy
  // engine must not take the portfolio page down with it.
  for (const f of await listFollowed(member.orgId)) {
    const at = positionOf(f);
    let rights: RightWatch[];
    try {
      rights = (await standing(f, at, { owner: member.userId })).rights;
    } catch {
      // The engine is busy: the boundary's reading alone (lib/watch/status.ts).
      rights = at.ended || at.used.exercised.length > 0 ? [] : boundaryReading(f.model, f.result, at.t, at.value);
    }
    for (const r of rights)
      if (r.status === 'in_region' || r.status === 'near')
        rows.push({
          ...r,
          caseId: f.caseId,
          caseName: f.caseName,
          projectId: f.projectId,
          projectName: f.projectName,
          currency: f.currency,
          asOf: at.asOf,
          value: at.value,
          valueOn: at.valueOn,
        });
  }
  return rows;
}
