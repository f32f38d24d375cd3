/**
 * From `Authorization: Bearer <key>` to the member the request acts as: the key's organisation,
 * the role it was given, and the user row it acts as (so its writes are attributed to
 * "API key <name> (created by …)"). 401 for a malformed, unknown, revoked or expired key, or one
 * whose creator is no longer an admin of the organisation; 429 past the per-key rate.
 */
import 'server-only';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { db } from '@/db';
import { findApiKeyByHash, touchApiKey } from '@/db/queries/api-keys';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { API_KEY_REQUESTS_PER_MINUTE } from './limits';
import { hashApiKey, looksLikeApiKey } from './secret';

declare global {
  // Counted once per process, kept on globalThis: Next.js may load this module more than once
  // (lib/bundle-brand.ts), and a count per copy would let a key make its share in each.
  var leewayApiKeyLimiter: RateLimiterMemory | undefined;
}
globalThis.leewayApiKeyLimiter ??= new RateLimiterMemory({ points: API_KEY_REQUESTS_PER_MINUTE, duration: 60 });
/** Requests per key per minute in this process; the engine's own limits are per organisation. */
export const limiter: RateLimiterMemory = globalThis.leewayApiKeyLimiter;

/** Last use is written at most once a minute per key, not on every request. */
const TOUCH_AFTER_MS = 60_000;

const INVALID = 'This API key is not valid. Send a live key as "Authorization: Bearer <key>".';

export async function authenticateApiKey(key: string): Promise<Member> {
  if (!looksLikeApiKey(key)) throw new AppError('unauthorized', INVALID);
  const found = await findApiKeyByHash(db, { secretHash: hashApiKey(key) });
  if (!found) throw new AppError('unauthorized', INVALID);
  if (found.revoked_at) throw new AppError('unauthorized', 'This API key has been revoked.');
  if (found.expires_at && found.expires_at.getTime() <= Date.now()) throw new AppError('unauthorized', 'This API key has expired.');
  if (found.creator_role !== 'admin')
    throw new AppError('unauthorized', 'This API key no longer works: the admin who created it is no longer an admin of the organisation.');
  try {
    await limiter.consume(found.id);
  } catch (refusal) {
    if (!(refusal instanceof RateLimiterRes)) throw refusal;
    throw new AppError(
      'rate_limited',
      `This API key has made ${API_KEY_REQUESTS_PER_MINUTE} requests in the last minute; wait and try again.`,
      undefined,
      Math.max(1, Math.ceil(refusal.msBeforeNext / 1000)),
    );
  }
  if (!found.last_used_at || Date.now() - found.last_used_at.getTime() > TOUCH_AFTER_MS) await touchApiKey(db, { keyId: found.id });
  return {
    userId: found.actor_id,
    name: found.actor_name,
    email: found.actor_email,
    orgId: found.organization_id,
    orgName: found.organization_name,
    role: found.role,
    isDemo: found.organization_metadata?.includes('"demo":true') ?? false,
    apiKeyId: found.id,
  };
}
