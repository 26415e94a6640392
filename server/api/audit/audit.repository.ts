import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
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

/** Writes one audit row; call it inside the transaction of the change it records. */
export function recordAudit(db: DbOrTx, actor: Actor, entry: AuditEntry): void {
  db.insert(auditEvents)
    .values({
      id: newId(),
      orgId: actor.orgId,
      userId: actor.userId,
      action: entry.action,
      subject: entry.subject,
      at: new Date().toISOString(),
      detail: entry.detail ?? {},
    })
    .run();
}
