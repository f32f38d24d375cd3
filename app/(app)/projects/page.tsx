import type { Metadata } from 'next';
import { EmptyState } from '@/components/empty-state';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { guardPage } from '@/lib/page-guard';

export const metadata: Metadata = { title: 'Projects' };

export default async function ProjectsPage() {
  const member = await guardPage({ project: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  return (
    <>
      <PageHeader title="Projects" lead="Each project holds its cases: cash flows, uncertainty and the flexibility management has." />
      <EmptyState title="No projects yet">Projects created by your analysts will be listed here.</EmptyState>
    </>
  );
}
