import type { Metadata } from 'next';
import { EmptyState } from '@/components/empty-state';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { guardPage } from '@/lib/page-guard';

export const metadata: Metadata = { title: 'Review' };

export default async function ReviewPage() {
  const member = await guardPage({ review: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  return (
    <>
      <PageHeader title="Review" lead="Cases submitted for the finance committee's decision." />
      <EmptyState title="Nothing is waiting for review">Cases submitted by analysts appear here for reviewers to comment on, approve or return.</EmptyState>
    </>
  );
}
