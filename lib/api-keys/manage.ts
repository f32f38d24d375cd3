/**
 * What admins do with keys: create one (the secret is returned once and never stored), list
 * them, revoke one. Each change is written with its audit entry in one transaction.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createApiKey, listApiKeys, revokeApiKey } from '@/db/queries/api-keys';
import type { Member } from '../dal';
import { AppError } from '../errors';
import type { ApiKeyCreate } from '../validations/api-key';
import { newApiKey } from './secret';

const DAY_MS = 24 * 60 * 60 * 1000;

export async function createKey(admin: Member, input: ApiKeyCreate) {
  const { key, prefix, secretHash } = newApiKey();
  const expiresAt = input.expiresInDays ? new Date(Date.now() + input.expiresInDays * DAY_MS) : null;
  const made = await db.transaction().execute(async (trx) => {
    const made = await createApiKey(trx, {
      orgId: admin.orgId,
      createdBy: admin.userId,
      creatorName: admin.name,
      name: input.name,
      role: input.role,
      prefix,
      secretHash,
      expiresAt,
    });
    await recordAudit(trx, {
      orgId: admin.orgId,
      actorId: admin.userId,
      action: 'api_key.create',
      subjectType: 'api_key',
      subjectId: made.id,
      detail: { name: input.name, role: input.role, prefix },
    });
    return made;
  });
  return { id: made.id, name: made.name, role: made.role, prefix: made.prefix, key, createdAt: made.created_at, expiresAt: made.expires_at };
}

export async function listKeys(admin: Member) {
  const rows = await listApiKeys(db, { orgId: admin.orgId });
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    role: r.role,
    prefix: r.prefix,
    createdAt: r.created_at,
    createdBy: r.created_by_name,
    expiresAt: r.expires_at,
    lastUsedAt: r.last_used_at,
    revokedAt: r.revoked_at,
  }));
}

export type ApiKeyListing = Awaited<ReturnType<typeof listKeys>>[number];

export async function revokeKey(admin: Member, keyId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const revoked = await revokeApiKey(trx, { orgId: admin.orgId, keyId });
    if (!revoked) throw new AppError('not_found', 'There is no such live API key in your organisation.');
    await recordAudit(trx, {
      orgId: admin.orgId,
      actorId: admin.userId,
      action: 'api_key.revoke',
      subjectType: 'api_key',
      subjectId: keyId,
      detail: { name: revoked.name },
    });
  });
}
