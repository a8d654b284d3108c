import type { Transaction } from 'sequelize';
import { AuditEvent, type AuditArea } from '../../models/audit-event.model';

export interface AuditInput {
  actorId: number | null;
  area: AuditArea;
  action: string;
  subjectType: string;
  subjectId?: string | null;
  reason?: string | null;
  details?: unknown;
}

/** Appends one row to the audit log (inside the caller's transaction when given). */
export async function recordAudit(input: AuditInput, transaction?: Transaction) {
  return AuditEvent.create(
    {
      ...input,
      subjectId: input.subjectId ?? null,
      reason: input.reason ?? null,
      details: input.details ?? null,
    },
    { transaction },
  );
}
