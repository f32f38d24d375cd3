/** How projects and cases appear in the API. */
import type { Case, Project } from '@/db/types';
import type { listProjectActivity } from '@/db/queries/summaries';
import type { CaseJson } from './case-json';

export function presentProject(p: Project) {
  return {
    id: p.id,
    name: p.name,
    description: p.description,
    currency: p.currency,
    status: p.status,
    ownerId: p.owner_id,
    createdAt: p.created_at,
    updatedAt: p.updated_at,
  };
}

export function presentCase(c: Case) {
  return {
    id: c.id,
    projectId: c.project_id,
    name: c.name,
    version: c.version,
    status: c.status,
    cashFlows: c.cash_flows,
    settings: c.settings,
    options: c.options,
    createdAt: c.created_at,
    updatedAt: c.updated_at,
  };
}

/** A project's cases, each with its latest run's figures, as `GET /api/v1/projects/{id}/cases` answers. */
export function presentProjectCases<Latest>(list: { stored: Case; latest: Latest }[]) {
  return { cases: list.map((c) => ({ ...presentCase(c.stored), latest: c.latest })) };
}

/** A project's audit trail, newest first, as `GET /api/v1/projects/{id}/activity` answers. */
export function presentActivity(entries: Awaited<ReturnType<typeof listProjectActivity>>) {
  return {
    activity: entries.map((e) => ({
      id: e.id,
      action: e.action,
      subjectType: e.subject_type,
      subjectId: e.subject_id,
      detail: e.detail,
      actor: e.actorName,
      at: e.created_at,
    })),
  };
}

/**
 * An answer as the API's JSON carries it (dates as ISO text), for a page that hands it to an
 * island that fetches the same answer from the API.
 */
export function asJson<T>(answer: unknown): T {
  return JSON.parse(JSON.stringify(answer)) as T;
}

/** A case as the API's JSON carries it, for a page that hands it to the editor. */
export function caseAsJson(c: Case): CaseJson {
  return asJson<CaseJson>(presentCase(c));
}
