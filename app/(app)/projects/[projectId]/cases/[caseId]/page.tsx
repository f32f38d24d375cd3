import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { Forbidden } from '@/components/forbidden';
import { caseAsJson } from '@/lib/case-response';
import { readCase } from '@/lib/cases/service';
import { guardPage, orNotFound } from '@/lib/page-guard';
import { roleAllows } from '@/lib/permissions';
import { readProject } from '@/lib/projects/service';
import { CaseEditor } from './_components/case-editor';

export const metadata: Metadata = { title: 'Case' };

export default async function CasePage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string; caseId: string }>;
  searchParams: Promise<{ tab?: string | string[] }>;
}) {
  const member = await guardPage({ case: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  const { projectId, caseId } = await params;
  const { tab } = await searchParams;
  const [project, found] = await Promise.all([orNotFound(readProject(member, projectId)), orNotFound(readCase(member, caseId))]);
  if (found.project_id !== project.id) notFound();
  return (
    <CaseEditor
      caseId={found.id}
      loaded={caseAsJson(found)}
      projectId={project.id}
      projectName={project.name}
      currency={project.currency}
      canEdit={roleAllows(member.role, { case: ['update'] })}
      initialTab={typeof tab === 'string' ? tab : undefined}
      rights={{
        canSubmit: roleAllows(member.role, { case: ['submit'] }),
        canDecide: roleAllows(member.role, { review: ['decide'] }),
        canComment: roleAllows(member.role, { review: ['comment'] }),
        canRerun: roleAllows(member.role, { review: ['read'] }),
        canCrossCheck: roleAllows(member.role, { review: ['comment'] }),
      }}
    />
  );
}
