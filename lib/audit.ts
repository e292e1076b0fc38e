import type { Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { AuditEvent } from '@/models';

export interface AuditInput {
  action: string;
  actorId?: string | null;
  workspaceId?: string | null;
  targetType?: string;
  targetId?: string;
  data?: Record<string, unknown>;
}

/** Appends an audit event; inside a transaction when one is given, so it rolls back with the write. */
export async function recordAudit(input: AuditInput, transaction?: Transaction): Promise<void> {
  getSequelize();
  await AuditEvent.create(
    {
      action: input.action,
      actorId: input.actorId ?? null,
      workspaceId: input.workspaceId ?? null,
      targetType: input.targetType ?? null,
      targetId: input.targetId ?? null,
      data: input.data ?? {},
    },
    { transaction },
  );
}
