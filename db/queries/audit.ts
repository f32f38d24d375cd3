/** The audit log: who did what to which record, per organisation. */
import type { Database } from '../index';
import type { AuditLogEntry } from '../types';

export interface AuditEvent {
  orgId: string;
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId?: string | null;
  detail?: Record<string, unknown>;
}

export async function recordAudit(db: Database, event: AuditEvent): Promise<void> {
  await db
    .insertInto('audit_log')
    .values({
      organization_id: event.orgId,
      actor_id: event.actorId,
      action: event.action,
      subject_type: event.subjectType,
      subject_id: event.subjectId ?? null,
      detail: event.detail ?? {},
    })
    .execute();
}

export async function listAudit(
  db: Database,
  { orgId, limit = 50 }: { orgId: string; limit?: number },
): Promise<(AuditLogEntry & { actor_name: string | null })[]> {
  return db
    .selectFrom('audit_log')
    .leftJoin('user', 'user.id', 'audit_log.actor_id')
    .selectAll('audit_log')
    .select('user.name as actor_name')
    .where('audit_log.organization_id', '=', orgId)
    .orderBy('audit_log.created_at', 'desc')
    .orderBy('audit_log.id', 'desc')
    .limit(limit)
    .execute();
}
