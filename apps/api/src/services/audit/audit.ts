import type { Transaction } from 'sequelize';
import { AuditEntry } from '../../db/models/index.js';

export async function audit(
  entry: { actorId: string | null; action: string; subjectType: string; subjectId?: string | null; details?: Record<string, unknown> },
  transaction?: Transaction,
) {
  await AuditEntry.create(
    { actorId: entry.actorId, action: entry.action, subjectType: entry.subjectType, subjectId: entry.subjectId ?? null, details: entry.details ?? {} },
    { transaction },
  );
}
