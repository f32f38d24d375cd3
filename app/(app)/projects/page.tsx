import type { Metadata } from 'next';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { guardPage } from '@/lib/page-guard';
import { roleAllows } from '@/lib/permissions';
import { readSettings } from '@/lib/settings/service';
import { NewProjectButton } from './_components/new-project-button';
import { ProjectList } from './_components/project-list';

export const metadata: Metadata = { title: 'Projects' };

export default async function ProjectsPage() {
  const member = await guardPage({ project: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  const canCreate = roleAllows(member.role, { project: ['create'] });
  const currency = canCreate ? (await readSettings(member.orgId)).currency : '';
  return (
    <>
      <PageHeader
        title="Projects"
        lead="Each project holds its cases: cash flows, uncertainty and the flexibility management has."
        actions={canCreate ? <NewProjectButton defaultCurrency={currency} /> : null}
      />
      <ProjectList canCreate={canCreate} />
    </>
  );
}
