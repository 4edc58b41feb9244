/**
 * The logbook entries linked to a run (read-only: the logbook feature owns entries). Reads the entry, its
 * current revision's title and its author.
 */
import { and, desc, eq } from "drizzle-orm";
import { db } from "./client";
import { entries, entryRevisions, entryRuns, users } from "./schema";

/** An entry linked to a run, as the run page lists it. */
export interface LinkedEntry {
  id: number;
  category: string;
  title: string;
  author: string;
  createdAt: string;
  retracted: boolean;
}

/** Entries linked to a run number, newest first. */
export async function linkedEntries(runNumber: number): Promise<LinkedEntry[]> {
  const rows = await db
    .select({
      id: entries.id,
      category: entries.category,
      title: entryRevisions.title,
      author: users.displayName,
      createdAt: entries.createdAt,
      retractedAt: entries.retractedAt,
    })
    .from(entryRuns)
    .innerJoin(entries, eq(entries.id, entryRuns.entryId))
    .innerJoin(entryRevisions, and(eq(entryRevisions.entryId, entries.id), eq(entryRevisions.revision, entries.currentRevision)))
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(eq(entryRuns.runNumber, runNumber))
    .orderBy(desc(entries.createdAt), desc(entries.id));
  return rows.map((r) => ({
    id: r.id,
    category: r.category,
    title: r.title,
    author: r.author,
    createdAt: r.createdAt.toISOString(),
    retracted: r.retractedAt !== null,
  }));
}
