/** A case with its project, as the review routes and e-mails name it; scoped by organisation. */
import 'server-only';
import { db } from '@/db';
import { findCasesWithProject } from '@/db/queries/cases';
import { missingCase } from '../cases/require-case';

export async function loadCaseRef(orgId: string, caseId: string) {
  const [row] = await findCasesWithProject(db, { orgId, caseIds: [caseId] });
  if (!row) throw missingCase();
  return row;
}

export function refOf(row: Awaited<ReturnType<typeof loadCaseRef>>, expandedNpv: number) {
  return {
    orgId: row.organization_id,
    caseId: row.id,
    projectId: row.project_id,
    projectName: row.project_name,
    caseName: row.name,
    currency: row.currency,
    expandedNpv,
  };
}
