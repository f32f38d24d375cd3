import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/empty-state';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { listKeys } from '@/lib/api-keys/manage';
import { formatDate, formatDateTime } from '@/lib/format';
import { guardPage } from '@/lib/page-guard';
import { roleLabels } from '@/lib/permissions';
import { SettingsNav } from '../_components/settings-nav';
import { CreateKeyForm } from './_components/create-key-form';
import { RevokeKeyButton } from './_components/revoke-key-button';

export const metadata: Metadata = { title: 'API keys' };

function standing(key: { revokedAt: Date | null; expiresAt: Date | null }): string {
  if (key.revokedAt) return `Revoked ${formatDate(key.revokedAt)}`;
  if (key.expiresAt && key.expiresAt.getTime() <= Date.now()) return `Expired ${formatDate(key.expiresAt)}`;
  return key.expiresAt ? `Live until ${formatDate(key.expiresAt)}` : 'Live, no expiry';
}

export default async function ApiKeysPage() {
  const member = await guardPage({ apiKey: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  const keys = await listKeys(member);
  return (
    <>
      <PageHeader title="Settings" lead={`Keys that let the systems of ${member.orgName} read and write through the API.`} />
      <SettingsNav />
      <section aria-labelledby="create-key-heading" className="mb-10">
        <h2 id="create-key-heading" className="mb-1">
          Create a key
        </h2>
        <p className="mb-3 max-w-prose text-ink-soft">
          A key acts in this organisation with the role you give it; what it writes is recorded as “API key <em>name</em> (created by {member.name})”. It stops
          working when it is revoked, when it expires, or when you are no longer an admin here. How to use it:{' '}
          <Link href="/api-reference" className="underline">
            API reference
          </Link>
          .
        </p>
        <CreateKeyForm />
      </section>
      <section aria-labelledby="keys-heading">
        <h2 id="keys-heading" className="mb-3">
          Keys ({keys.length})
        </h2>
        {keys.length === 0 ? (
          <EmptyState title="No API keys yet">Create one above for a planning system, a BI tool or a script.</EmptyState>
        ) : (
          <Table caption="API keys">
            <thead>
              <tr>
                <Th>Name</Th>
                <Th>Starts with</Th>
                <Th>Role</Th>
                <Th>Created</Th>
                <Th>Last used</Th>
                <Th>Standing</Th>
                <Th>
                  <span className="sr-only">Actions</span>
                </Th>
              </tr>
            </thead>
            <tbody>
              {keys.map((k) => (
                <Tr key={k.id}>
                  <Td>{k.name}</Td>
                  <Td>
                    <code className="font-mono text-caption">{k.prefix}…</code>
                  </Td>
                  <Td>{roleLabels[k.role]}</Td>
                  <Td>
                    {formatDate(k.createdAt)}
                    {k.createdBy ? <span className="block text-caption text-ink-muted">by {k.createdBy}</span> : null}
                  </Td>
                  <Td>{k.lastUsedAt ? formatDateTime(k.lastUsedAt) : 'Never'}</Td>
                  <Td>{standing(k)}</Td>
                  <Td>{k.revokedAt ? null : <RevokeKeyButton keyId={k.id} name={k.name} />}</Td>
                </Tr>
              ))}
            </tbody>
          </Table>
        )}
      </section>
    </>
  );
}
