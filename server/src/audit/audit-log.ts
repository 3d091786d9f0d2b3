import type { Transaction } from 'sequelize';
import { AuditEvent } from '../models/init-models';

export interface AuditEntry {
  workspaceId: string | null;
  actorId: string | null;
  action: string;
  targetType: string;
  targetId?: string | null;
  targetLabel?: string | null;
  details?: Record<string, unknown>;
}

/** Appends one audit event (inside the caller's transaction when given). */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  await AuditEvent.create(
    {
      workspaceId: entry.workspaceId,
      actorId: entry.actorId,
      action: entry.action,
      targetType: entry.targetType,
      targetId: entry.targetId ?? null,
      targetLabel: entry.targetLabel ?? null,
      details: entry.details ?? {},
    },
    { transaction },
  );
}
