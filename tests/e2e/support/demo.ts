/** Finds a seeded demo case by its project's and its own name (the demo data is invented). */
import { db } from '@/db';

export async function demoCase(project: string, name: string): Promise<{ caseId: string; projectId: string; url: string }> {
  const row = await db
    .selectFrom('case')
    .innerJoin('project', 'project.id', 'case.project_id')
    .select(['case.id', 'case.project_id'])
    .where('project.name', '=', project)
    .where('case.name', '=', name)
    .executeTakeFirstOrThrow();
  return { caseId: row.id, projectId: row.project_id, url: `/projects/${row.project_id}/cases/${row.id}` };
}

/** Every tab of a case page, by its address (the ids of case-editor.tsx's tabs). */
export const caseTabUrls = (caseUrl: string) =>
  ['cash-flows', 'uncertainty', 'flexibility', 'results', 'lattice', 'documents', 'watch', 'review'].map((tab) => `${caseUrl}?tab=${tab}`);
