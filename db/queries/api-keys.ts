/** Organisation API keys: created, listed, revoked and found by the hash of their secret. */
import { randomUUID } from 'node:crypto';
import type { Database } from '../index';
import type { ApiKeyTable } from '../types';

export type ApiKeyRole = ApiKeyTable['role'];

/**
 * A key and the user row it acts as, written together. The user row has no account (so no
 * password and no sign-in) and no membership (so it is in no member list); its name is what
 * the audit log, the review record and the activity list show for the key's actions.
 */
export async function createApiKey(
  trx: Database,
  args: { orgId: string; createdBy: string; creatorName: string; name: string; role: ApiKeyRole; prefix: string; secretHash: string; expiresAt: Date | null },
) {
  const id = randomUUID();
  const actorId = randomUUID();
  const now = new Date();
  await trx
    .insertInto('user')
    .values({
      id: actorId,
      name: `API key ${args.name} (created by ${args.creatorName})`,
      // A reserved top-level domain (RFC 2606): nothing can be delivered to it, nobody can own it.
      email: `api-key-${id}@api-keys.invalid`,
      emailVerified: false,
      image: null,
      createdAt: now,
      updatedAt: now,
    })
    .execute();
  return trx
    .insertInto('api_key')
    .values({
      id,
      organization_id: args.orgId,
      actor_id: actorId,
      created_by: args.createdBy,
      name: args.name,
      role: args.role,
      prefix: args.prefix,
      secret_hash: args.secretHash,
      expires_at: args.expiresAt,
    })
    .returning(['id', 'name', 'role', 'prefix', 'created_at', 'expires_at'])
    .executeTakeFirstOrThrow();
}

export async function listApiKeys(db: Database, { orgId }: { orgId: string }) {
  return db
    .selectFrom('api_key')
    .leftJoin('user as creator', 'creator.id', 'api_key.created_by')
    .select([
      'api_key.id',
      'api_key.name',
      'api_key.role',
      'api_key.prefix',
      'api_key.created_at',
      'api_key.expires_at',
      'api_key.last_used_at',
      'api_key.revoked_at',
      'creator.name as created_by_name',
    ])
    .where('api_key.organization_id', '=', orgId)
    .orderBy('api_key.revoked_at', (ob) => ob.desc().nullsFirst())
    .orderBy('api_key.created_at', 'desc')
    .execute();
}

/** Revokes a key of the organisation; undefined when there is no such live key. */
export async function revokeApiKey(trx: Database, { orgId, keyId }: { orgId: string; keyId: string }) {
  return trx
    .updateTable('api_key')
    .set({ revoked_at: new Date() })
    .where('id', '=', keyId)
    .where('organization_id', '=', orgId)
    .where('revoked_at', 'is', null)
    .returning(['id', 'name'])
    .executeTakeFirst();
}

/**
 * The key with this secret hash, with what authenticating it needs: its organisation, the user
 * row it acts as, and its creator's current role in the organisation (a key is only as good as
 * an admin's standing: once its creator is no longer an admin there, it stops working).
 */
export async function findApiKeyByHash(db: Database, { secretHash }: { secretHash: string }) {
  return db
    .selectFrom('api_key')
    .innerJoin('organization', 'organization.id', 'api_key.organization_id')
    .innerJoin('user as actor', 'actor.id', 'api_key.actor_id')
    .leftJoin('member as creator', (join) =>
      join.onRef('creator.userId', '=', 'api_key.created_by').onRef('creator.organizationId', '=', 'api_key.organization_id'),
    )
    .select([
      'api_key.id',
      'api_key.organization_id',
      'api_key.actor_id',
      'api_key.role',
      'api_key.expires_at',
      'api_key.revoked_at',
      'api_key.last_used_at',
      'organization.name as organization_name',
      'organization.metadata as organization_metadata',
      'actor.name as actor_name',
      'actor.email as actor_email',
      'creator.role as creator_role',
    ])
    .where('api_key.secret_hash', '=', secretHash)
    .executeTakeFirst();
}

export async function touchApiKey(db: Database, { keyId }: { keyId: string }): Promise<void> {
  await db.updateTable('api_key').set({ last_used_at: new Date() }).where('id', '=', keyId).execute();
}
