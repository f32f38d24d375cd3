import type { Metadata } from 'next';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { ValuationCaution } from '@/components/valuation-caution';
import { guardPage } from '@/lib/page-guard';
import { ReviewQueue } from './_components/review-queue';

export const metadata: Metadata = { title: 'Review' };

export default async function ReviewPage() {
  const member = await guardPage({ review: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  return (
    <>
      <PageHeader
        title="Review"
        lead="Cases submitted for the finance committee's decision. Open one to read its frozen snapshot, comment, approve or return it."
      />
      <ReviewQueue />
      <div className="mt-8">
        <ValuationCaution />
      </div>
    </>
  );
}
