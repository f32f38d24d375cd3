import Link from 'next/link';
import { redirect } from 'next/navigation';
import type { ReactNode } from 'react';
import { NavLinks } from '@/components/nav-links';
import { SignOutButton } from '@/components/sign-out-button';
import { Wordmark } from '@/components/wordmark';
import { currentViewer } from '@/lib/dal';
import { navigationFor } from '@/lib/navigation';
import { roleLabels } from '@/lib/permissions';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const viewer = await currentViewer();
  if (!viewer) redirect('/sign-in');
  const items = viewer.role ? navigationFor(viewer.role) : [];
  return (
    // Below md (768 px) the rail becomes a band across the top, so a phone or a narrow window
    // keeps its full width for the figures.
    <div className="flex min-h-screen flex-col md:flex-row">
      {/* The first stop for the keyboard: past the navigation to the page (shown when focused). */}
      <a
        href="#main"
        className="sr-only rounded-md border border-line bg-paper-raised text-body font-medium text-tide-700 shadow-card focus:not-sr-only focus:fixed focus:left-4 focus:top-4 focus:z-50 focus:px-4 focus:py-2"
      >
        Skip to the page
      </a>
      <aside className="flex w-full shrink-0 flex-col border-b border-line bg-paper-raised px-4 py-4 md:w-rail md:border-b-0 md:border-r md:py-6">
        <div className="px-3">
          <Wordmark />
        </div>
        {viewer.orgName ? (
          <p className="mt-3 px-3 text-caption uppercase tracking-wide text-ink-muted md:mt-6" data-testid="organisation-name">
            {viewer.orgName}
          </p>
        ) : null}
        {viewer.isDemo ? (
          <p className="mx-3 mt-2 rounded bg-ember-100 px-2 py-1 text-caption text-ember-700">Demo organisation: invented company and figures</p>
        ) : null}
        <div className="mt-2">
          <NavLinks items={items} />
        </div>
        <div className="mt-3 flex flex-wrap items-baseline gap-x-4 gap-y-1 border-t border-line px-3 pt-3 md:mt-auto md:block md:pt-4">
          <div>
            <p className="text-body font-medium text-ink">{viewer.name}</p>
            <p className="text-caption text-ink-muted">
              {viewer.email}
              {viewer.role ? ` · ${roleLabels[viewer.role]}` : ''}
            </p>
          </div>
          <p className="md:mt-3">
            <Link href="/api-reference" className="text-caption text-tide-600 hover:underline">
              API reference
            </Link>
          </p>
          <div className="md:mt-3">
            <SignOutButton />
          </div>
        </div>
      </aside>
      <main id="main" tabIndex={-1} className="min-w-0 focus-visible:outline-none flex-1 px-4 py-6 md:px-8 md:py-8 xl:px-12">
        {children}
      </main>
    </div>
  );
}
