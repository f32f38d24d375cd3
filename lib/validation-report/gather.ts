/**
 * Gathers a validation report for a case as saved: the version valued now by the current engine
 * (in the worker pool, with its extras), the names to print, the version's newest finished
 * cross-check and the build's reference results.
 */
import 'server-only';
import { db } from '@/db';
import { latestFinishedCrossCheck, findReportNames } from '@/db/queries/validation-reports';
import type { PageSize } from '../board-pack/data';
import { requireCase } from '../cases/require-case';
import type { CrossCheckResult } from '../cross-check/run';
import type { Member } from '../dal';
import { valueStoredCase } from '../value-case';
import type { ValidationReportData } from './data';
import { readReferenceResults } from './reference-results';

export async function gatherValidationReport(member: Member, caseId: string, pageSize: PageSize, signal?: AbortSignal): Promise<ValidationReportData> {
  const found = await requireCase(db, member.orgId, caseId);
  const [names, valued, crossCheck, references] = await Promise.all([
    findReportNames(db, { orgId: member.orgId, projectId: found.project_id }),
    valueStoredCase(found, undefined, { owner: member.userId, signal }),
    latestFinishedCrossCheck(db, { orgId: member.orgId, caseId: found.id, caseVersion: found.version }),
    readReferenceResults(),
  ]);
  return {
    pageSize,
    organisation: names.organisation,
    isDemo: names.isDemo,
    generatedAt: new Date().toISOString(),
    project: { name: names.projectName, currency: names.currency },
    caseName: found.name,
    caseVersion: found.version,
    inputs: valued.inputs,
    model: valued.model,
    result: valued.result,
    inputHash: valued.inputHash,
    resultHash: valued.resultHash,
    crossCheck:
      crossCheck && crossCheck.result
        ? {
            paths: crossCheck.paths,
            seed: crossCheck.seed,
            engineVersion: crossCheck.engine_version,
            at: new Date(crossCheck.created_at).toISOString(),
            result: crossCheck.result as unknown as CrossCheckResult,
          }
        : null,
    references,
  };
}
