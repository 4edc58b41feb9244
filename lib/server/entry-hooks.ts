/**
 * Called by the logbook after every saved entry revision (create or edit), inside no transaction.
 * The safety review queue hangs off this: safety categories and entries marked for review enter the queue,
 * and an edit after acknowledgement puts the item back.
 */
export type SavedEntry = {
  entryId: number;
  revision: number;
  category: string;
  title: string;
  needsSafetyReview: boolean;
  authorId: number;
};

/** React to a saved entry revision. */
export async function afterEntrySaved(_entry: SavedEntry): Promise<void> {
  // Filled in by the safety review queue.
}
