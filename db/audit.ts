/** Writes to the audit trail. Callers pass their transaction so the change and its audit row land together. */
import { desc } from "drizzle-orm";
import { db, type Database } from "./client";
import { auditEvents } from "./schema";

export type Actor = { userId?: number | null; tokenId?: number | null };
type Executor = Pick<Database, "insert">;

/** Append one audit row: who did what to which record, with details. */
export async function audit(
  actor: Actor,
  action: string,
  record: { type: string; id: string | number },
  details?: Record<string, unknown>,
  tx: Executor = db,
): Promise<void> {
  await tx.insert(auditEvents).values({
    actorUserId: actor.userId ?? null,
    actorTokenId: actor.tokenId ?? null,
    action,
    recordType: record.type,
    recordId: String(record.id),
    details: details ?? null,
  });
}

/** The newest audit rows, for the admin page. */
export async function recentAudit(limit = 100) {
  return db.select().from(auditEvents).orderBy(desc(auditEvents.id)).limit(limit);
}
