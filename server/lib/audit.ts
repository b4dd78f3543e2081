import type { Tx } from '../db/client';
import { auditLog } from '../db/schema/index';
import type { SessionUser } from './session';

export type AuditEntry = {
  actor: Pick<SessionUser, 'id' | 'email'> | null;
  action: string;
  entityType: string;
  entityId: string | number;
  before?: unknown;
  after?: unknown;
};

/**
 * Records who changed money, status or roles. Call it with the same transaction as the change,
 * so the record exists exactly when the change does.
 */
export async function recordAudit(tx: Tx, e: AuditEntry) {
  await tx.insert(auditLog).values({
    actorId: e.actor?.id ?? null,
    actorEmail: e.actor?.email ?? null,
    action: e.action,
    entityType: e.entityType,
    entityId: String(e.entityId),
    before: e.before ?? null,
    after: e.after ?? null,
  });
}
