import type { Metadata } from 'next';
import { EmptyState } from '@/components/empty-state';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { ValuationCaution } from '@/components/valuation-caution';
import { guardPage } from '@/lib/page-guard';

export const metadata: Metadata = { title: 'Portfolio' };

export default async function PortfolioPage() {
  const member = await guardPage({ project: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  return (
    <>
      <PageHeader title="Portfolio" lead={`Static and expanded NPV of the projects at ${member.orgName}, side by side.`} />
      <EmptyState title="No projects have been valued yet">
        When analysts value a project, it appears here with its static NPV, option premium and expanded NPV.
      </EmptyState>
      <div className="mt-8">
        <ValuationCaution />
      </div>
    </>
  );
}
