/**
 * The page-side use of lib/dal.ts: a page calls `guardPage(permission)` first. No session sends
 * the user to sign-in, no organisation to the welcome page; a role without the permission gets
 * `'forbidden'`, which the page renders as a refusal (nothing of the page's data is loaded).
 * A record the member cannot see is Next's 404 page: `await orNotFound(readProject(member, id))`.
 */
import 'server-only';
import { notFound, redirect } from 'next/navigation';
import { currentViewer, type Member } from './dal';
import { AppError } from './errors';
import { roleAllows, type Permission } from './permissions';

export async function guardPage(permission?: Permission): Promise<Member | 'forbidden'> {
  const viewer = await currentViewer();
  if (!viewer) redirect('/sign-in');
  if (!viewer.orgId || !viewer.role) redirect('/welcome');
  const member = viewer as Member;
  if (permission && !roleAllows(member.role, permission)) return 'forbidden';
  return member;
}

/** What a service read, or the 404 page when it says there is no such record in the organisation. */
export async function orNotFound<T>(read: Promise<T>): Promise<T> {
  try {
    return await read;
  } catch (error) {
    if (error instanceof AppError && error.code === 'not_found') notFound();
    throw error;
  }
}
