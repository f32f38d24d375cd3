/**
 * The data-access gate every page, server action and route handler passes through. It reads
 * the session on the server (never trusting the client), finds the user's membership in the
 * session's organisation, and checks the role against lib/permissions.ts. Cached per request.
 *
 * Outcomes: no session → 401 (pages redirect to sign-in); wrong role → 403; another
 * organisation's record → 404 (callers scope every lookup by `orgId`).
 */
import 'server-only';
import { headers } from 'next/headers';
import { cache } from 'react';
import { db } from '@/db';
import { findMembership } from '@/db/queries/members';
import { auth } from './auth';
import { AppError } from './errors';
import { isRoleName, roleAllows, type Permission, type RoleName } from './permissions';

export interface Viewer {
  userId: string;
  name: string;
  email: string;
  orgId: string | null;
  orgName: string | null;
  role: RoleName | null;
  /** The organisation is one of the invented demo organisations. */
  isDemo: boolean;
}

export interface Member extends Viewer {
  orgId: string;
  orgName: string;
  role: RoleName;
  /** Set when the request authenticated with an organisation API key (lib/api-keys/). */
  apiKeyId?: string;
}

/** The signed-in user, or null. Resolves the organisation from the session (or the first membership). */
export const currentViewer = cache(async (): Promise<Viewer | null> => {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) return null;
  const { user } = session;
  const activeOrg = (session.session as { activeOrganizationId?: string | null }).activeOrganizationId ?? null;
  // One query: the membership in the session's organisation (or the first one) with the organisation's name.
  const membership = await findMembership(db, { userId: user.id, orgId: activeOrg });
  const orgId = membership?.organizationId ?? null;
  const orgName = membership?.organizationName ?? null;
  const isDemo = membership?.organizationMetadata?.includes('"demo":true') ?? false;
  const role = membership && isRoleName(membership.role) ? membership.role : null;
  return { userId: user.id, name: user.name, email: user.email, orgId, orgName, role, isDemo };
});

/** A signed-in member of an organisation, or an AppError (401 without a session, 403 without a membership). */
export async function requireUser(): Promise<Member> {
  const viewer = await currentViewer();
  if (!viewer) throw new AppError('unauthorized', 'Please sign in.');
  if (!viewer.orgId || !viewer.role || !viewer.orgName) throw new AppError('forbidden', 'You are not a member of an organisation yet.');
  return viewer as Member;
}

/** A member whose role grants every action asked for, or an AppError (401 / 403). */
export async function requirePermission(permission: Permission): Promise<Member> {
  return requireRole(await requireUser(), permission);
}

/** The member itself when its role grants every action asked for; 403 otherwise. */
export function requireRole(member: Member, permission: Permission): Member {
  if (!roleAllows(member.role, permission)) throw new AppError('forbidden', 'Your role does not allow this.');
  return member;
}
