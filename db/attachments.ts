/**
 * Attachment records. The bytes live in S3 under a key the server makes (entries/{entryId}/{uuid}); the file name is
 * display text only. A record is "pending" while its bytes travel, then "stored", or "failed" with the reason.
 */
import { randomUUID } from "node:crypto";
import { and, asc, eq } from "drizzle-orm";
import { db } from "./client";
import { audit, type Actor } from "./audit";
import { attachments, users } from "./schema";

export type AttachmentState = (typeof attachments.$inferSelect)["state"];

export type AttachmentView = {
  id: number;
  entryId: number;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  state: AttachmentState;
  failureReason: string | null;
  uploadedBy: number;
  uploadedByName: string;
  createdAt: Date;
  /** Where the app serves it (a redirect to a short-lived presigned URL). */
  url: string;
};

const viewColumns = {
  id: attachments.id,
  entryId: attachments.entryId,
  fileName: attachments.fileName,
  contentType: attachments.contentType,
  sizeBytes: attachments.sizeBytes,
  state: attachments.state,
  failureReason: attachments.failureReason,
  uploadedBy: attachments.uploadedBy,
  uploadedByName: users.displayName,
  createdAt: attachments.createdAt,
};

type Row = Omit<AttachmentView, "url">;
const withUrl = (r: Row): AttachmentView => ({ ...r, url: `/api/attachments/${r.id}` });

/** A fresh, unguessable object key for an entry's file; never derived from the file name. */
export function newObjectKey(entryId: number): string {
  return `entries/${entryId}/${randomUUID()}`;
}

/** Record an upload that is starting (state pending) and return it with its server-made object key. */
export async function startAttachment(
  actor: Actor & { userId: number },
  input: { entryId: number; fileName: string; contentType: string; sizeBytes: number },
): Promise<{ id: number; objectKey: string }> {
  const objectKey = newObjectKey(input.entryId);
  const [res] = await db.insert(attachments).values({ ...input, objectKey, state: "pending", uploadedBy: actor.userId });
  return { id: res.insertId, objectKey };
}

/** Reuse a failed record of the same entry for a retry: back to pending with a new key; null if it cannot be retried. */
export async function restartAttachment(
  attachmentId: number,
  input: { entryId: number; fileName: string; contentType: string; sizeBytes: number },
): Promise<{ id: number; objectKey: string } | null> {
  const objectKey = newObjectKey(input.entryId);
  const [res] = await db
    .update(attachments)
    .set({ ...input, objectKey, state: "pending", failureReason: null })
    .where(and(eq(attachments.id, attachmentId), eq(attachments.entryId, input.entryId), eq(attachments.state, "failed")));
  return res.affectedRows === 1 ? { id: attachmentId, objectKey } : null;
}

/** Mark the bytes as stored, with the type the server determined; audited. */
export async function markStored(actor: Actor, attachmentId: number, fields: { contentType: string; sizeBytes: number }): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.update(attachments).set({ state: "stored", failureReason: null, ...fields }).where(eq(attachments.id, attachmentId));
    await audit(actor, "attachment.store", { type: "attachment", id: attachmentId }, fields, tx);
  });
}

/** Mark an upload as failed with the reason shown to the writer (cut to the column's 300 characters); audited. */
export async function markFailed(actor: Actor, attachmentId: number, reason: string): Promise<void> {
  const short = reason.length > 300 ? `${reason.slice(0, 299)}…` : reason;
  await db.transaction(async (tx) => {
    await tx.update(attachments).set({ state: "failed", failureReason: short }).where(eq(attachments.id, attachmentId));
    await audit(actor, "attachment.fail", { type: "attachment", id: attachmentId }, { reason: short }, tx);
  });
}

/** One attachment with its object key (for serving), or null. */
export async function getAttachment(attachmentId: number): Promise<(AttachmentView & { objectKey: string }) | null> {
  const [row] = await db
    .select({ ...viewColumns, objectKey: attachments.objectKey })
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.uploadedBy))
    .where(eq(attachments.id, attachmentId))
    .limit(1);
  return row ? { ...withUrl(row), objectKey: row.objectKey } : null;
}

/** Every attachment of an entry, oldest first. */
export async function listAttachments(entryId: number): Promise<AttachmentView[]> {
  const rows = await db
    .select(viewColumns)
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.uploadedBy))
    .where(eq(attachments.entryId, entryId))
    .orderBy(asc(attachments.id));
  return rows.map(withUrl);
}
