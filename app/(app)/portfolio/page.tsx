import type { Metadata } from 'next';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { ValuationCaution } from '@/components/valuation-caution';
import { guardPage } from '@/lib/page-guard';
import { roleAllows } from '@/lib/permissions';
import { PortfolioView } from './_components/portfolio-view';
import { WatchList } from './_components/watch-list';
import { watchList } from '@/lib/watch/follow';

export const metadata: Metadata = { title: 'Portfolio' };

export default async function PortfolioPage() {
  const member = await guardPage({ project: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  return (
    <>
      <PageHeader title="Portfolio" lead={`Static and expanded NPV of the projects at ${member.orgName}, side by side.`} />
      <PortfolioView canCreate={roleAllows(member.role, { project: ['create'] })} />
      <div className="mt-8">
        <WatchList rows={await watchList(member)} />
      </div>
      <div className="mt-8">
        <ValuationCaution />
      </div>
    </>
  );
}
