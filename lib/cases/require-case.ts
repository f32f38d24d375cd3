/**
 * A case of the member's organisation, or the one 404 every route gives for a case that is not
 * there or belongs to another organisation (the two are never told apart).
 */
import { findCase, NO_SUCH_CASE } from '@/db/queries/cases';
import type { Database } from '@/db';
import type { Case } from '@/db/types';
import { AppError } from '../errors';

export function missingCase(): AppError {
  return new AppError('not_found', NO_SUCH_CASE);
}

export async function requireCase(executor: Database, orgId: string, caseId: string): Promise<Case> {
  const found = await findCase(executor, { orgId, caseId });
  if (!found) throw missingCase();
  return found;
}
