/**
 * The safety review queue: one item per entry that needs a safety officer's eyes, its moves and their trail.
 * Every change writes its event and its audit row in the same transaction. The rules (which moves are
 * allowed, when a revision re-opens an item) live in components/safety/review-flow.ts.
 */
import { and, asc, eq, inArray, lt, sql } from "drizzle-orm";
import { db } from "./client";
import { audit, type Actor } from "./audit";
import { entries, entryRevisions, safetyReviewEvents, safetyReviews, users, REVIEW_STATES, type EntryCategory, type ReviewState } from "./schema";
import { checkMove, reopenComment, stateAfterRevision } from "../components/safety/review-flow";

/** One queue item with what the queue page shows about its entry. */
export type QueueItem = {
  reviewId: number;
  entryId: number;
  state: ReviewState;
  enteredAt: Date;
  updatedAt: Date;
  reviewedRevision: number | null;
  category: EntryCategory;
  needsSafetyReview: boolean;
  currentRevision: number;
  title: string;
  authorId: number;
  authorName: string;
  retracted: boolean;
};

/** Thrown when a review item does not exist. */
export class ReviewNotFoundError extends Error {
  constructor(what: string) {
    super(`no safety review item ${what}`);
    this.name = "ReviewNotFoundError";
  }
}

const itemColumns = {
  reviewId: safetyReviews.id,
  entryId: safetyReviews.entryId,
  state: safetyReviews.state,
  enteredAt: safetyReviews.enteredAt,
  updatedAt: safetyReviews.updatedAt,
  reviewedRevision: safetyReviews.reviewedRevision,
  category: entries.category,
  needsSafetyReview: entries.needsSafetyReview,
  currentRevision: entries.currentRevision,
  title: entryRevisions.title,
  authorId: entries.authorId,
  authorName: users.displayName,
  retractedAt: entries.retractedAt,
};

function itemsQuery() {
  return db
    .select(itemColumns)
    .from(safetyReviews)
    .innerJoin(entries, eq(entries.id, safetyReviews.entryId))
    .innerJoin(entryRevisions, and(eq(entryRevisions.entryId, entries.id), eq(entryRevisions.revision, entries.currentRevision)))
    .innerJoin(users, eq(users.id, entries.authorId))
    .$dynamic();
}

function toItem(row: Awaited<ReturnType<typeof itemsQuery>>[number]): QueueItem {
  const { retractedAt, ...rest } = row;
  return { ...rest, retracted: retractedAt !== null };
}

/** Queue items, oldest first, optionally only some states and one category. */
export async function listQueue(filter: { states?: readonly ReviewState[]; category?: EntryCategory } = {}): Promise<QueueItem[]> {
  const conds = [];
  if (filter.states && filter.states.length > 0) conds.push(inArray(safetyReviews.state, [...filter.states]));
  if (filter.category) conds.push(eq(entries.category, filter.category));
  const rows = await itemsQuery().where(conds.length ? and(...conds) : undefined).orderBy(asc(safetyReviews.enteredAt), asc(safetyReviews.id));
  return rows.map(toItem);
}

/** How many items are in each state. */
export async function queueCounts(): Promise<Record<ReviewState, number>> {
  const rows = await db.select({ state: safetyReviews.state, n: sql<number>`count(*)` }).from(safetyReviews).groupBy(safetyReviews.state);
  const counts = Object.fromEntries(REVIEW_STATES.map((s) => [s, 0])) as Record<ReviewState, number>;
  for (const r of rows) counts[r.state] = Number(r.n);
  return counts;
}

/** One item by review id (or by entry id), or null. */
export async function getQueueItem(by: { reviewId: number } | { entryId: number }): Promise<QueueItem | null> {
  const cond = "reviewId" in by ? eq(safetyReviews.id, by.reviewId) : eq(safetyReviews.entryId, by.entryId);
  const [row] = await itemsQuery().where(cond).limit(1);
  return row ? toItem(row) : null;
}

/** The item's trail of moves, oldest first, with who made each. */
export async function reviewEvents(reviewId: number) {
  return db
    .select({
      id: safetyReviewEvents.id,
      fromState: safetyReviewEvents.fromState,
      toState: safetyReviewEvents.toState,
      comment: safetyReviewEvents.comment,
      at: safetyReviewEvents.at,
      actorName: users.displayName,
    })
    .from(safetyReviewEvents)
    .leftJoin(users, eq(users.id, safetyReviewEvents.actorId))
    .where(eq(safetyReviewEvents.reviewId, reviewId))
    .orderBy(asc(safetyReviewEvents.at), asc(safetyReviewEvents.id));
}

/** Put an entry into the queue unless it is there already; returns the item id and whether it is new. */
export async function enqueueEntry(
  actor: Actor,
  entry: { entryId: number; revision: number },
  at: Date = new Date(),
): Promise<{ reviewId: number; created: boolean }> {
  return db.transaction(async (tx) => {
    const [res] = await tx.insert(safetyReviews).ignore().values({ entryId: entry.entryId, state: "awaiting_review", enteredAt: at, updatedAt: at });
    if (res.affectedRows !== 1) {
      const [existing] = await tx.select({ id: safetyReviews.id }).from(safetyReviews).where(eq(safetyReviews.entryId, entry.entryId)).limit(1);
      if (!existing) throw new ReviewNotFoundError(`for entry ${entry.entryId}`);
      return { reviewId: existing.id, created: false };
    }
    const reviewId = res.insertId;
    await tx.insert(safetyReviewEvents).values({
      reviewId, fromState: null, toState: "awaiting_review", comment: `entered the queue with revision ${entry.revision}`, actorId: actor.userId ?? null, at,
    });
    await audit(actor, "safety.review.enqueue", { type: "safety_review", id: reviewId }, { entryId: entry.entryId, revision: entry.revision }, tx);
    return { reviewId, created: true };
  });
}

/**
 * A new revision of the entry: re-open the item if it had been reviewed before this revision.
 * Re-opening resets entered_at, so the item's age counts from its return to the queue.
 */
export async function reopenForRevision(actor: Actor, reviewId: number, revision: number, at: Date = new Date()): Promise<boolean> {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(safetyReviews).where(eq(safetyReviews.id, reviewId)).for("update");
    if (!row) throw new ReviewNotFoundError(String(reviewId));
    const next = stateAfterRevision(row.state);
    if (!next.reopen || (row.reviewedRevision !== null && revision <= row.reviewedRevision)) return false;
    await tx.update(safetyReviews).set({ state: next.state, enteredAt: at, updatedAt: at }).where(eq(safetyReviews.id, reviewId));
    await tx.insert(safetyReviewEvents).values({ reviewId, fromState: row.state, toState: next.state, comment: reopenComment(revision), actorId: actor.userId ?? null, at });
    await audit(actor, "safety.review.reopen", { type: "safety_review", id: reviewId }, { from: row.state, revision }, tx);
    return true;
  });
}

/** A safety officer's move with its (required) comment; checks the move table; audited. */
export async function moveReview(
  actor: Actor,
  reviewId: number,
  to: unknown,
  comment: unknown,
  at: Date = new Date(),
): Promise<{ from: ReviewState; to: ReviewState; comment: string; entryId: number }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ state: safetyReviews.state, entryId: safetyReviews.entryId, currentRevision: entries.currentRevision })
      .from(safetyReviews)
      .innerJoin(entries, eq(entries.id, safetyReviews.entryId))
      .where(eq(safetyReviews.id, reviewId))
      .for("update");
    if (!row) throw new ReviewNotFoundError(String(reviewId));
    const text = checkMove(row.state, to, comment);
    const target = to as ReviewState;
    await tx.update(safetyReviews).set({ state: target, reviewedRevision: row.currentRevision, updatedAt: at }).where(eq(safetyReviews.id, reviewId));
    await tx.insert(safetyReviewEvents).values({ reviewId, fromState: row.state, toState: target, comment: text, actorId: actor.userId ?? null, at });
    await audit(actor, "safety.review.move", { type: "safety_review", id: reviewId }, { from: row.state, to: target, comment: text, revision: row.currentRevision }, tx);
    return { from: row.state, to: target, comment: text, entryId: row.entryId };
  });
}

/** Open items (awaiting review or follow-up) that entered the queue before `cutoff`, oldest first. */
export async function openItemsEnteredBefore(cutoff: Date): Promise<QueueItem[]> {
  const rows = await itemsQuery()
    .where(and(inArray(safetyReviews.state, ["awaiting_review", "follow_up"]), lt(safetyReviews.enteredAt, cutoff)))
    .orderBy(asc(safetyReviews.enteredAt), asc(safetyReviews.id));
  return rows.map(toItem);
}

/** E-mail and name of a user, for notices to an entry's writer. */
export async function userContact(userId: number): Promise<{ email: string; displayName: string; active: boolean } | null> {
  const [row] = await db.select({ email: users.email, displayName: users.displayName, active: users.active }).from(users).where(eq(users.id, userId)).limit(1);
  return row ?? null;
}
