import type { Metadata } from 'next';
import Link from 'next/link';
import { currentViewer } from '@/lib/dal';
import { readInvitation } from '@/lib/members/service';
import { isRoleName, roleLabels } from '@/lib/permissions';
import { AcceptInvitation } from './_components/accept-invitation';

export const metadata: Metadata = { title: 'Accept invitation' };

export default async function AcceptInvitationPage({ params }: { params: Promise<{ invitationId: string }> }) {
  const { invitationId } = await params;
  const invitation = await readInvitation(invitationId);
  const usable = invitation && invitation.status === 'pending' && new Date(invitation.expiresAt) > new Date();
  if (!invitation || !usable) {
    return (
      <>
        <h1>This invitation cannot be used</h1>
        <p className="mt-2 text-ink-soft">It may have expired, been cancelled or been accepted already. Ask your Leeway admin to invite you again.</p>
      </>
    );
  }
  const role = invitation.role && isRoleName(invitation.role) ? roleLabels[invitation.role] : 'member';
  const viewer = await currentViewer();
  const here = `/accept-invitation/${invitation.id}`;
  return (
    <>
      <h1>Join {invitation.organizationName}</h1>
      <p className="mt-2 text-ink-soft">
        You are invited as <strong className="text-ink">{role}</strong> with the address <strong className="text-ink">{invitation.email}</strong>.
      </p>
      {!viewer ? (
        <div className="mt-6 flex flex-col gap-3">
          <Link
            href={`/sign-up?email=${encodeURIComponent(invitation.email)}&invitation=${invitation.id}`}
            className="rounded-md bg-tide-500 px-4 py-2 text-center font-medium text-white hover:bg-tide-600"
          >
            Create an account
          </Link>
          <Link href={`/sign-in?next=${encodeURIComponent(here)}`} className="text-center text-tide-600 underline">
            I already have an account
          </Link>
        </div>
      ) : viewer.email.toLowerCase() !== invitation.email.toLowerCase() ? (
        <p role="alert" className="mt-6 rounded-md bg-ember-100 px-3 py-2 text-ember-700">
          You are signed in as {viewer.email}. Sign out and sign in as {invitation.email} to accept.
        </p>
      ) : (
        <AcceptInvitation invitationId={invitation.id} />
      )}
    </>
  );
}
