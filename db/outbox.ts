/** The outbox table: every message is written here first; the mailer sends and marks them. */
import { and, asc, eq, gt, isNull, lt, sql } from "drizzle-orm";
import { db } from "./client";
import { outbox } from "./schema";

export type OutgoingMessage = { kind: string; to: string; subject: string; text: string; dedupeKey?: string };

/** Queue one message; a repeated dedupe key is ignored (returns false). */
export async function enqueue(message: OutgoingMessage): Promise<boolean> {
  const [res] = await db
    .insert(outbox)
    .ignore()
    .values({ kind: message.kind, toAddress: message.to, subject: message.subject, textBody: message.text, dedupeKey: message.dedupeKey ?? null });
  return res.affectedRows === 1;
}

type Outgoing = typeof outbox.$inferSelect;

/**
 * Take the oldest unsent message after `afterId`, lock it (SKIP LOCKED, so two flushers never take the same one),
 * hand it to `deliver`, and mark it sent or failed in the same transaction. Returns null when nothing is left.
 */
export async function deliverNext(afterId: number, deliver: (m: Outgoing) => Promise<void>): Promise<{ id: number; error?: unknown } | null> {
  return db.transaction(async (tx) => {
    const [m] = await tx
      .select()
      .from(outbox)
      .where(and(isNull(outbox.sentAt), gt(outbox.id, afterId), lt(outbox.attempts, 1000)))
      .orderBy(asc(outbox.id))
      .limit(1)
      .for("update", { skipLocked: true });
    if (!m) return null;
    try {
      await deliver(m);
      await tx.update(outbox).set({ sentAt: new Date(), attempts: sql`${outbox.attempts} + 1`, lastError: null }).where(eq(outbox.id, m.id));
      return { id: m.id };
    } catch (error) {
      const text = error instanceof Error ? error.message : String(error);
      await tx.update(outbox).set({ attempts: sql`${outbox.attempts} + 1`, lastError: text.slice(0, 500) }).where(eq(outbox.id, m.id));
      return { id: m.id, error };
    }
  });
}
