import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { rawRunPerDb, slot } from '@/db/prepared';
import { auditEvents } from '@/db/schema';

export interface Actor {
  userId: string;
  orgId: string;
}

export interface AuditEntry {
  action: string;
  subject: string;
  detail?: Record<string, unknown>;
}

const auditInsert = rawRunPerDb((db) =>
  db.insert(auditEvents).values({
    id: slot('id'),
    orgId: slot('orgId'),
    userId: slot('userId'),
    action: slot('action'),
    subject: slot('subject'),
    at: slot('at'),
    detail: slot('detail'),
  }),
);

/**
 * Writes one audit row; call it inside the transaction of the change it records. The statement is prepared
 * once; its parameters follow the order of its `values` keys.
 */
export function recordAudit(db: DbOrTx, actor: Actor, entry: AuditEntry): void {
  auditInsert(
    db,
    newId(),
    actor.orgId,
    actor.userId,
    entry.action,
    entry.subject,
    new Date().toISOString(),
    JSON.stringify(entry.detail ?? {}),
  );
}
