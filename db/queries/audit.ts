/** The audit log: who did what to which record, per organisation. */
import type { Database } from '../index';

export interface AuditEvent {
  orgId: string;
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId?: string | null;
  detail?: Record<string, unknown>;
  /** When it happened; now unless given (the demo seed writes a history that began in the past). */
  at?: Date;
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
      ...(event.at ? { created_at: event.at } : {}),
    })
    .execute();
}
