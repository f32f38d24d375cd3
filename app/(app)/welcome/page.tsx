import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { PageHeader } from '@/components/page-header';
import { currentViewer } from '@/lib/dal';
import { invitationsWaitingFor } from '@/lib/members/service';
import { CreateOrganisationForm } from './_components/create-organisation-form';

export const metadata: Metadata = { title: 'Welcome' };

export default async function WelcomePage() {
  const viewer = await currentViewer();
  if (!viewer) redirect('/sign-in');
  if (viewer.orgId) redirect('/portfolio');
  const invitations = await invitationsWaitingFor(viewer);
  return (
    <>
      <PageHeader title={`Welcome, ${viewer.name}`} lead="You are not a member of an organisation yet." />
      {invitations.length > 0 ? (
        <section className="mb-10">
          <h2>You have been invited</h2>
          <ul className="mt-3 flex flex-col gap-2">
            {invitations.map((inv) => (
              <li key={inv.id}>
                <Link href={`/accept-invitation/${inv.id}`} className="text-tide-600 underline">
                  Join {inv.name}
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <section>
        <h2>Start a new organisation</h2>
        <p className="mt-1 text-ink-soft">You will be its admin and can invite analysts, reviewers and executives.</p>
        <CreateOrganisationForm />
      </section>
    </>
  );
}
