/** Calls the after-save hook (the safety review queue) once a revision is committed. */
import type { SavedRevision } from "@/db/entries";
import type { SavedEntry } from "@/lib/server/entry-hooks";

/**
 * Run the hook; the revision is already saved, so a failing hook must not turn the save into an error the writer
 * would retry (and so duplicate). The failure is logged and reported back as a warning instead.
 */
export async function runEntryHook(hook: (e: SavedEntry) => Promise<void>, saved: SavedRevision): Promise<string | null> {
  try {
    await hook({ ...saved });
    return null;
  } catch (err) {
    console.error(`afterEntrySaved failed for entry ${saved.entryId} revision ${saved.revision}:`, err);
    return "the entry was saved, but passing it to the safety review queue failed; tell a safety officer";
  }
}
