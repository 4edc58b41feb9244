/** The outbox table: every message is written here first; the mailer sends and marks them. */
import { and, asc, eq, isNull, lt, sql } from "drizzle-orm";
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

/** Messages not yet sent, oldest first. */
export async function unsent(limit = 50) {
  return db.select().from(outbox).where(and(isNull(outbox.sentAt), lt(outbox.attempts, 1000))).orderBy(asc(outbox.id)).limit(limit);
}

/** Mark a message sent. */
export async function markSent(id: number): Promise<void> {
  await db.update(outbox).set({ sentAt: new Date(), attempts: sql`${outbox.attempts} + 1`, lastError: null }).where(eq(outbox.id, id));
}

/** Note a failed attempt; the message stays queued. */
export async function markFailed(id: number, error: string): Promise<void> {
  await db.update(outbox).set({ attempts: sql`${outbox.attempts} + 1`, lastError: error.slice(0, 500) }).where(eq(outbox.id, id));
}

/** How many messages wait, for the health page. */
export async function unsentCount(): Promise<number> {
  const [row] = await db.select({ n: sql<number>`count(*)` }).from(outbox).where(isNull(outbox.sentAt));
  return Number(row?.n ?? 0);
}
