/**
 * Called by the logbook after every saved entry revision (create or edit), inside no transaction.
 * The safety review queue hangs off this: safety categories and entries marked for review enter the queue,
 * and an edit after acknowledgement puts the item back.
 */
import { enqueueEntry, getQueueItem, reopenForRevision } from "@/db/safety";
import { belongsInQueue } from "@/components/safety/review-flow";
import { notifyReviewItem } from "./safety-jobs";

export type SavedEntry = {
  entryId: number;
  revision: number;
  category: string;
  title: string;
  needsSafetyReview: boolean;
  authorId: number;
};

/**
 * React to a saved entry revision: enqueue a new safety item (and mail the safety officers at once), or
 * re-open a reviewed item when a newer revision arrives. An item already awaiting review is left alone.
 */
export async function afterEntrySaved(entry: SavedEntry): Promise<void> {
  const actor = { userId: entry.authorId };
  const existing = await getQueueItem({ entryId: entry.entryId });
  if (!existing) {
    // An entry edited into a safety category (or newly marked) enters the queue at that revision.
    if (!belongsInQueue(entry.category, entry.needsSafetyReview)) return;
    const { reviewId, created } = await enqueueEntry(actor, entry);
    if (created) await notifyReviewItem(reviewId);
    return;
  }
  if (await reopenForRevision(actor, existing.reviewId, entry.revision)) await notifyReviewItem(existing.reviewId, entry.revision);
}
