/**
 * Logbook entries, append-only: creating writes revision 1; an edit names the revision it started from and, when that
 * is still the newest, adds the next revision (the old one stays, is_current flips). Retraction marks, never deletes.
 * Every change writes its audit row in the same transaction.
 */
import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db, type Database } from "./client";
import { audit, type Actor } from "./audit";
import { entries, entryRevisions, entryRuns, entryTags, users, type EntryCategory } from "./schema";
import { listAttachments, type AttachmentView } from "./attachments";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
export type WriterActor = Actor & { userId: number };

export type NewEntry = {
  category: EntryCategory;
  title: string;
  body: string;
  tags: string[];
  runNumbers: number[];
  needsSafetyReview: boolean;
};

export type EntryEdit = Omit<NewEntry, "category" | "needsSafetyReview"> & {
  baseRevision: number;
  category?: EntryCategory;
  needsSafetyReview?: boolean;
};

/** What was saved, as the safety hook and the API want it. */
export type SavedRevision = { entryId: number; revision: number; category: EntryCategory; title: string; needsSafetyReview: boolean; authorId: number };

/** The entry does not exist. */
export class EntryNotFoundError extends Error {
  readonly code = "not_found";
  constructor(id: number) {
    super(`there is no entry ${id}`);
  }
}

/** The edit started from an older revision than the newest: someone else saved in between. */
export class StaleRevisionError extends Error {
  readonly code = "stale_revision";
  constructor(
    readonly baseRevision: number,
    readonly currentRevision: number,
  ) {
    super(`this entry has changed since you opened it: you edited revision ${baseRevision}, the newest is revision ${currentRevision}`);
  }
}

/** A retracted entry takes no edits and no second retraction. */
export class EntryRetractedError extends Error {
  readonly code = "retracted";
  constructor(id: number) {
    super(`entry ${id} has been retracted and can no longer be changed`);
  }
}

async function replaceLinks(tx: Tx, entryId: number, tags: string[], runNumbers: number[]): Promise<void> {
  await tx.delete(entryTags).where(eq(entryTags.entryId, entryId));
  await tx.delete(entryRuns).where(eq(entryRuns.entryId, entryId));
  if (tags.length) await tx.insert(entryTags).values(tags.map((tag) => ({ entryId, tag })));
  if (runNumbers.length) await tx.insert(entryRuns).values(runNumbers.map((runNumber) => ({ entryId, runNumber })));
}

/** Create an entry with its first revision; `at` back-dates it (demo data only). */
export async function createEntry(actor: WriterActor, input: NewEntry, opts: { at?: Date } = {}): Promise<SavedRevision> {
  const at = opts.at ?? new Date();
  return db.transaction(async (tx) => {
    const [res] = await tx.insert(entries).values({
      category: input.category,
      authorId: actor.userId,
      currentRevision: 1,
      needsSafetyReview: input.needsSafetyReview,
      createdAt: at,
      updatedAt: at,
    });
    const entryId = res.insertId;
    await tx.insert(entryRevisions).values({
      entryId,
      revision: 1,
      title: input.title,
      body: input.body,
      tags: input.tags,
      runNumbers: input.runNumbers,
      authorId: actor.userId,
      createdAt: at,
      isCurrent: true,
    });
    await replaceLinks(tx, entryId, input.tags, input.runNumbers);
    await audit(actor, "entry.create", { type: "entry", id: entryId }, { category: input.category, title: input.title, revision: 1 }, tx);
    return { entryId, revision: 1, category: input.category, title: input.title, needsSafetyReview: input.needsSafetyReview, authorId: actor.userId };
  });
}

/** Add the next revision when `baseRevision` is still the newest; otherwise StaleRevisionError with the newest number. */
export async function reviseEntry(actor: WriterActor, entryId: number, edit: EntryEdit, opts: { at?: Date } = {}): Promise<SavedRevision> {
  const at = opts.at ?? new Date();
  return db.transaction(async (tx) => {
    // The row lock serialises concurrent edits of one entry, so exactly one of two racing saves wins.
    const [entry] = await tx.select().from(entries).where(eq(entries.id, entryId)).for("update");
    if (!entry) throw new EntryNotFoundError(entryId);
    if (entry.retractedAt) throw new EntryRetractedError(entryId);
    if (edit.baseRevision !== entry.currentRevision) throw new StaleRevisionError(edit.baseRevision, entry.currentRevision);
    const revision = entry.currentRevision + 1;
    const category = edit.category ?? entry.category;
    const needsSafetyReview = edit.needsSafetyReview ?? entry.needsSafetyReview;
    await tx.update(entryRevisions).set({ isCurrent: false }).where(and(eq(entryRevisions.entryId, entryId), eq(entryRevisions.isCurrent, true)));
    await tx.insert(entryRevisions).values({
      entryId,
      revision,
      title: edit.title,
      body: edit.body,
      tags: edit.tags,
      runNumbers: edit.runNumbers,
      authorId: actor.userId,
      createdAt: at,
      isCurrent: true,
    });
    await tx.update(entries).set({ currentRevision: revision, category, needsSafetyReview, updatedAt: at }).where(eq(entries.id, entryId));
    await replaceLinks(tx, entryId, edit.tags, edit.runNumbers);
    const changed = { category: category !== entry.category ? category : undefined, needsSafetyReview: needsSafetyReview !== entry.needsSafetyReview ? needsSafetyReview : undefined };
    await audit(actor, "entry.revise", { type: "entry", id: entryId }, { revision, title: edit.title, ...changed }, tx);
    return { entryId, revision, category, title: edit.title, needsSafetyReview, authorId: actor.userId };
  });
}

/** Retract an entry with a reason (admins only, checked by the caller); it stays readable, marked as retracted. */
export async function retractEntry(actor: WriterActor, entryId: number, reason: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [entry] = await tx.select().from(entries).where(eq(entries.id, entryId)).for("update");
    if (!entry) throw new EntryNotFoundError(entryId);
    if (entry.retractedAt) throw new EntryRetractedError(entryId);
    await tx.update(entries).set({ retractedAt: new Date(), retractedBy: actor.userId, retractReason: reason }).where(eq(entries.id, entryId));
    await audit(actor, "entry.retract", { type: "entry", id: entryId }, { reason, revision: entry.currentRevision }, tx);
  });
}

export type RevisionView = {
  revision: number;
  title: string;
  body: string;
  tags: string[];
  runNumbers: number[];
  authorId: number;
  authorName: string;
  createdAt: Date;
  isCurrent: boolean;
};

export type EntryDetail = {
  id: number;
  category: EntryCategory;
  authorId: number;
  authorName: string;
  currentRevision: number;
  needsSafetyReview: boolean;
  createdAt: Date;
  updatedAt: Date;
  retractedAt: Date | null;
  retractedByName: string | null;
  retractReason: string | null;
  title: string;
  body: string;
  tags: string[];
  runNumbers: number[];
  revisions: RevisionView[];
  attachments: AttachmentView[];
};

/** One entry with every revision (oldest first) and its attachments, or null. */
export async function getEntry(entryId: number): Promise<EntryDetail | null> {
  const author = alias(users, "author");
  const retracter = alias(users, "retracter");
  const [row] = await db
    .select({ entry: entries, authorName: author.displayName, retractedByName: retracter.displayName })
    .from(entries)
    .innerJoin(author, eq(author.id, entries.authorId))
    .leftJoin(retracter, eq(retracter.id, entries.retractedBy))
    .where(eq(entries.id, entryId))
    .limit(1);
  if (!row) return null;
  const revisions = await db
    .select({ rev: entryRevisions, authorName: users.displayName })
    .from(entryRevisions)
    .innerJoin(users, eq(users.id, entryRevisions.authorId))
    .where(eq(entryRevisions.entryId, entryId))
    .orderBy(asc(entryRevisions.revision));
  const views: RevisionView[] = revisions.map(({ rev, authorName }) => ({
    revision: rev.revision,
    title: rev.title,
    body: rev.body,
    tags: rev.tags,
    runNumbers: rev.runNumbers,
    authorId: rev.authorId,
    authorName,
    createdAt: rev.createdAt,
    isCurrent: rev.isCurrent,
  }));
  const current = views.find((r) => r.revision === row.entry.currentRevision) ?? views[views.length - 1];
  if (!current) return null;
  const e = row.entry;
  return {
    id: e.id,
    category: e.category,
    authorId: e.authorId,
    authorName: row.authorName,
    currentRevision: e.currentRevision,
    needsSafetyReview: e.needsSafetyReview,
    createdAt: e.createdAt,
    updatedAt: e.updatedAt,
    retractedAt: e.retractedAt,
    retractedByName: row.retractedByName,
    retractReason: e.retractReason,
    title: current.title,
    body: current.body,
    tags: current.tags,
    runNumbers: current.runNumbers,
    revisions: views,
    attachments: await listAttachments(entryId),
  };
}

/** The entry's category, newest revision and retraction state (for quick checks before an upload). */
export async function entryState(entryId: number) {
  const [row] = await db
    .select({ id: entries.id, category: entries.category, currentRevision: entries.currentRevision, retractedAt: entries.retractedAt })
    .from(entries)
    .where(eq(entries.id, entryId))
    .limit(1);
  return row ?? null;
}

/** True when at least one entry exists (the demo seed adds entries only to an empty logbook). */
export async function anyEntries(executor: Pick<Database, "select"> = db): Promise<boolean> {
  const rows = await executor.select({ id: entries.id }).from(entries).limit(1);
  return rows.length > 0;
}
