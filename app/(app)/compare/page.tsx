import type { Metadata } from 'next';
import { Suspense } from 'react';
import { Forbidden } from '@/components/forbidden';
import { LoadingBlock } from '@/components/load-state';
import { PageHeader } from '@/components/page-header';
import { guardPage } from '@/lib/page-guard';
import { roleAllows } from '@/lib/permissions';
import { CompareView } from './_components/compare-view';

export const metadata: Metadata = { title: 'Compare' };

export default async function ComparePage() {
  const member = await guardPage({ case: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  return (
    <>
      <PageHeader title="Compare cases" lead="NPV with and without flexibility, each right's value and the key assumptions, side by side." />
      <Suspense fallback={<LoadingBlock label="Loading" />}>
        <CompareView canCreate={roleAllows(member.role, { project: ['create'] })} />
      </Suspense>
    </>
  );
}
