import type { Metadata } from 'next';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { formatDate } from '@/lib/format';
import { listMembership } from '@/lib/members/service';
import { guardPage } from '@/lib/page-guard';
import { isRoleName, roleLabels } from '@/lib/permissions';
import { SettingsNav } from '../_components/settings-nav';
import { CancelInvitationButton } from './_components/cancel-invitation-button';
import { InviteForm } from './_components/invite-form';
import { MemberRoleSelect, RemoveMemberButton } from './_components/member-row-actions';

export const metadata: Metadata = { title: 'Members' };

export default async function MembersPage() {
  const member = await guardPage({ member: ['update'] });
  if (member === 'forbidden') return <Forbidden />;
  const { members, invitations } = await listMembership(member);
  return (
    <>
      <PageHeader title="Settings" lead={`Who works on the cases of ${member.orgName}, and in which role.`} />
      <SettingsNav />
      <section aria-labelledby="invite-heading" className="mb-10">
        <h2 id="invite-heading" className="mb-3">
          Invite a member
        </h2>
        <InviteForm />
      </section>
      <section aria-labelledby="members-heading" className="mb-10">
        <h2 id="members-heading" className="mb-3">
          Members ({members.length})
        </h2>
        <Table caption="Members">
          <thead>
            <tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Role</Th>
              <Th>Since</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {members.map((m) => {
              const self = m.userId === member.userId;
              return (
                <Tr key={m.id}>
                  <Td>
                    {m.name}
                    {self ? <span className="ml-2 text-caption text-ink-muted">(you)</span> : null}
                  </Td>
                  <Td>{m.email}</Td>
                  <Td>
                    {self ? (
                      isRoleName(m.role) ? (
                        roleLabels[m.role]
                      ) : (
                        m.role
                      )
                    ) : (
                      <MemberRoleSelect memberId={m.id} role={m.role} name={m.name} disabled={false} />
                    )}
                  </Td>
                  <Td>{formatDate(m.createdAt)}</Td>
                  <Td className="text-right">{self ? null : <RemoveMemberButton memberId={m.id} name={m.name} />}</Td>
                </Tr>
              );
            })}
          </tbody>
        </Table>
      </section>
      <section aria-labelledby="invitations-heading">
        <h2 id="invitations-heading" className="mb-3">
          Pending invitations
        </h2>
        {invitations.length === 0 ? (
          <p className="text-ink-muted">No invitations are waiting.</p>
        ) : (
          <Table caption="Pending invitations">
            <thead>
              <tr>
                <Th>E-mail</Th>
                <Th>Role</Th>
                <Th>Expires</Th>
                <Th>
                  <span className="sr-only">Actions</span>
                </Th>
              </tr>
            </thead>
            <tbody>
              {invitations.map((inv) => (
                <Tr key={inv.id}>
                  <Td>{inv.email}</Td>
                  <Td>{inv.role && isRoleName(inv.role) ? roleLabels[inv.role] : inv.role}</Td>
                  <Td>{formatDate(inv.expiresAt)}</Td>
                  <Td className="text-right">
                    <CancelInvitationButton invitationId={inv.id} email={inv.email} />
                  </Td>
                </Tr>
              ))}
            </tbody>
          </Table>
        )}
      </section>
    </>
  );
}
