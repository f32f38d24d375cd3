import type { Metadata } from 'next';
import Link from 'next/link';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { ValuationCaution } from '@/components/valuation-caution';
import { guardPage, orNotFound } from '@/lib/page-guard';
import { roleAllows } from '@/lib/permissions';
import type { ActivityJson, CaseJson } from '@/lib/case-json';
import { asJson, presentActivity, presentProjectCases } from '@/lib/case-response';
import { readProjectOverview } from '@/lib/cases/service';
import { readSettings } from '@/lib/settings/service';
import { ActivityList } from './_components/activity-list';
import { CaseTable } from './_components/case-table';
import { ProjectActions } from './_components/project-actions';

export const metadata: Metadata = { title: 'Project' };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await guardPage({ project: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  const { projectId } = await params;
  // The cases and the activity come in the page's HTML: there before the script (and without it).
  const [{ project, cases, activity }, settings] = await Promise.all([orNotFound(readProjectOverview(member, projectId)), readSettings(member.orgId)]);
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-2 text-caption text-ink-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{' '}
        / {project.name}
      </nav>
      <PageHeader
        title={project.name}
        lead={project.status === 'archived' ? `Archived. ${project.description}`.trim() : project.description || undefined}
        actions={
          roleAllows(member.role, { project: ['update'] }) ? (
            <ProjectActions
              projectId={project.id}
              name={project.name}
              description={project.description}
              status={project.status}
              canDelete={roleAllows(member.role, { project: ['delete'] })}
            />
          ) : undefined
        }
      />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-8 xl:grid-cols-[minmax(0,1fr)_20rem]">
        <section aria-labelledby="cases-heading">
          <h2 id="cases-heading" className="mb-3">
            Cases
          </h2>
          <CaseTable
            projectId={project.id}
            currency={project.currency}
            initial={asJson<{ cases: CaseJson[] }>(presentProjectCases(cases))}
            canEdit={roleAllows(member.role, { case: ['create', 'delete'] })}
            defaults={{ wacc: settings.wacc, riskFreeRate: settings.risk_free_rate }}
          />
          <div className="mt-6">
            <ValuationCaution />
          </div>
        </section>
        <section aria-labelledby="activity-heading">
          <h2 id="activity-heading" className="mb-3">
            Activity
          </h2>
          <ActivityList projectId={project.id} currency={project.currency} initial={asJson<{ activity: ActivityJson[] }>(presentActivity(activity))} />
        </section>
      </div>
    </>
  );
}
