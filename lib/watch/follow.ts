/**
 * Following an approved case: record what the project is worth now, and say where each right
 * stands. The model followed is the latest approved snapshot; its valuation date is the day it
 * was approved, and dates become years after it at 365.25 days a year (the lattice's unit).
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addObservation, latestObservations, listFollowedSnapshots, listObservations } from '@/db/queries/observations';
import { latestApprovedSnapshot } from '@/db/queries/reviews';
import type { ProjectModel, ValuationResult } from '@/lattice';
import { requireCase } from '../cases/require-case';
import type { Member } from '../dal';
import { valueInWorker } from '../engine/pool';
import { AppError } from '../errors';
import type { ObservationInput } from '../validations/observation';
import { ClockError, modelAt } from './clock';
import { dateAfter, dateOf, yearsBetween } from './dates';
import { rightStatuses, type RightWatch } from './status';

/** Where each right stands by the approved run's boundary alone (lib/watch/status.ts). */
function boundaryReading(model: ProjectModel, result: ValuationResult, t: number, value: number): RightWatch[] {
  return rightStatuses({ options: model.options ?? [], switches: result.switches, horizon: model.horizon, volatility: model.underlying.volatility, t, value });
}

interface Standing {
  revaluedExpandedNpv: number | null;
  rights: RightWatch[];
}

/**
 * Where each right stands at (t, V): the boundary read from the approved run, and the model's own
 * answer at that point — the approved model re-valued from t with V, whose decision at its root
 * says which right (if any) to use now. That answer decides `in_region` (a value beyond the
 * approved lattice's nodes at that date has no boundary to read, but still has a decision).
 */
async function standing(
  model: ProjectModel,
  result: ValuationResult,
  t: number,
  value: number,
  run: { owner: string; signal?: AbortSignal },
): Promise<Standing> {
  const rights = boundaryReading(model, result, t, value);
  let now: ValuationResult;
  try {
    now = await valueInWorker(modelAt(model, t, value).model, { extras: false, grid: { steps: 0 } }, run);
  } catch (error) {
    if (error instanceof ClockError) return { revaluedExpandedNpv: null, rights };
    throw error;
  }
  const usedNow = now.grid?.steps[0]?.modes[now.startMode]?.decision[0] ?? null;
  const open = (r: RightWatch) => r.status === 'in_region' || r.status === 'near' || r.status === 'outside';
  return {
    revaluedExpandedNpv: now.expandedNpv,
    rights: rights.map((r): RightWatch =>
      !open(r) ? r : r.id === usedNow ? { ...r, status: 'in_region' } : r.status === 'in_region' ? { ...r, status: 'near' } : r,
    ),
  };
}

async function followed(orgId: string, caseId: string) {
  await requireCase(db, orgId, caseId);
  const snapshot = await latestApprovedSnapshot(db, { orgId, caseId });
  if (!snapshot?.decided_at) throw new AppError('conflict', 'This case has no approved version to follow yet: its rights are watched from their approval.');
  return { snapshot, valuationDate: dateOf(snapshot.decided_at), model: snapshot.model as ProjectModel, result: snapshot.result as ValuationResult };
}

export async function recordObservation(member: Member, caseId: string, input: ObservationInput) {
  const { valuationDate, model } = await followed(member.orgId, caseId);
  const refuse = (message: string) => new AppError('unprocessable', message, { date: [message] });
  if (input.date < valuationDate) throw refuse(`The date is before ${valuationDate}, when the version followed was approved.`);
  if (input.date > dateOf(new Date())) throw refuse('The date is in the future: record what is known today.');
  if (yearsBetween(valuationDate, input.date) >= model.horizon)
    throw refuse(`The date is beyond the model's horizon (${dateAfter(valuationDate, model.horizon)}): no right is left to follow.`);
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
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.observe',
      subjectType: 'case',
      subjectId: caseId,
      detail: { date: input.date, value: input.value, source: input.source },
    });
    return made;
  });
}

export async function watchCase(member: Member, caseId: string, signal?: AbortSignal) {
  const { snapshot, valuationDate, model, result } = await followed(member.orgId, caseId);
  const observations = await listObservations(db, { orgId: member.orgId, caseId });
  const latest = observations.at(-1);
  const asOf = latest?.observedOn ?? valuationDate;
  const t = yearsBetween(valuationDate, asOf);
  const value = latest?.value ?? model.underlying.value;
  const now = await standing(model, result, t, value, { owner: member.userId, signal });
  const revaluedExpandedNpv = now.revaluedExpandedNpv;
  const rights = now.rights.map((r) => ({
    ...r,
    windowOpensAt: r.windowOpensAt === null ? null : dateAfter(valuationDate, r.windowOpensAt),
    windowClosesAt: r.windowClosesAt === null ? null : dateAfter(valuationDate, r.windowClosesAt),
  }));
  return {
    followed: { snapshotId: snapshot.id, caseVersion: snapshot.case_version, valuationDate, horizon: model.horizon, value: model.underlying.value },
    // The approved rights with their boundaries, for the chart of observed values against them.
    switches: result.switches.map((s) => ({ id: s.id, kind: s.kind, exerciseProbability: s.exerciseProbability, boundary: s.boundary })),
    asOf,
    value,
    rights,
    observations,
    revaluedExpandedNpv,
  };
}

/**
 * Every approved right across the organisation's active projects that is in its region or near
 * its boundary at its case's latest observation (or at approval): the portfolio's watch list.
 */
export async function watchList(member: Member) {
  const orgId = member.orgId;
  const [followedCases, observed] = await Promise.all([listFollowedSnapshots(db, { orgId }), latestObservations(db, { orgId })]);
  const latest = new Map(observed.map((o) => [o.caseId, o]));
  const rows = [];
  // One case after another: the engine takes at most a few jobs per person at once, and a busy
  // engine must not take the portfolio page down with it.
  for (const f of followedCases) {
    if (!f.decidedAt) continue;
    const model = f.model as ProjectModel;
    const result = f.result as ValuationResult;
    const valuationDate = dateOf(f.decidedAt);
    const observation = latest.get(f.caseId);
    const asOf = observation?.observedOn ?? valuationDate;
    const value = observation?.value ?? model.underlying.value;
    const t = yearsBetween(valuationDate, asOf);
    let rights: RightWatch[];
    try {
      rights = (await standing(model, result, t, value, { owner: member.userId })).rights;
    } catch {
      // The engine is busy: the boundary's reading alone (lib/watch/status.ts).
      rights = boundaryReading(model, result, t, value);
    }
    for (const r of rights)
      if (r.status === 'in_region' || r.status === 'near')
        rows.push({ ...r, caseId: f.caseId, caseName: f.caseName, projectId: f.projectId, projectName: f.projectName, currency: f.currency, asOf, value });
  }
  return rows;
}
