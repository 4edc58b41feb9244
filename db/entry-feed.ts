/**
 * The logbook feed: current revisions, newest first, filtered by category, author, run, tag, date range and a
 * full-text search over the entry_revisions_fulltext index (MATCH … AGAINST in boolean mode).
 */
import { and, count, desc, eq, exists, gte, lt, sql, type SQL } from "drizzle-orm";
import { db } from "./client";
import { attachments, entries, entryRevisions, entryRuns, entryTags, users, type EntryCategory } from "./schema";
import { toBooleanQuery } from "../lib/logbook/search-query";

export type FeedFilters = {
  category?: EntryCategory;
  authorId?: number;
  runNumber?: number;
  tag?: string;
  /** Inclusive lower bound (UTC). */
  from?: Date;
  /** Exclusive upper bound (UTC). */
  until?: Date;
  /** Words to look for in title and text. */
  q?: string;
  limit?: number;
  offset?: number;
};

export type FeedItem = {
  id: number;
  category: EntryCategory;
  title: string;
  excerpt: string;
  authorId: number;
  authorName: string;
  createdAt: Date;
  updatedAt: Date;
  revision: number;
  tags: string[];
  runNumbers: number[];
  needsSafetyReview: boolean;
  retractedAt: Date | null;
  retractReason: string | null;
  attachmentCount: number;
};

export type FeedPage = { items: FeedItem[]; total: number; offset: number; limit: number; ignoredWords: string[] };

/** Markdown reduced to a one-line plain excerpt for the feed. */
function excerptOf(body: string, chars = 180): string {
  const plain = body
    .replace(/```[\s\S]*?```/g, " ")
    .replace(/^\s*\|?[\s:|-]*-{3,}[\s:|-]*$/gm, " ") // table separator rows
    .replace(/!\[[^\]]*\]\([^)]*\)/g, " ")
    .replace(/\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/^[#>\-*+\s]+|[*_`~|]|\[[ xX]\]/gm, " ")
    .replace(/\s+/g, " ")
    .trim();
  return plain.length > chars ? `${plain.slice(0, chars - 1)}…` : plain;
}

/** One page of the feed and the number of entries matching the filters. */
export async function listFeed(filters: FeedFilters = {}): Promise<FeedPage> {
  const limit = Math.min(Math.max(filters.limit ?? 50, 1), 200);
  const offset = Math.max(filters.offset ?? 0, 0);
  const where: SQL[] = [eq(entryRevisions.isCurrent, true)];
  if (filters.category) where.push(eq(entries.category, filters.category));
  if (filters.authorId) where.push(eq(entries.authorId, filters.authorId));
  if (filters.from) where.push(gte(entries.createdAt, filters.from));
  if (filters.until) where.push(lt(entries.createdAt, filters.until));
  if (filters.runNumber) {
    const linked = db.select({ one: sql`1` }).from(entryRuns).where(and(eq(entryRuns.entryId, entries.id), eq(entryRuns.runNumber, filters.runNumber)));
    where.push(exists(linked));
  }
  if (filters.tag) {
    const tagged = db.select({ one: sql`1` }).from(entryTags).where(and(eq(entryTags.entryId, entries.id), eq(entryTags.tag, filters.tag)));
    where.push(exists(tagged));
  }
  const search = filters.q ? toBooleanQuery(filters.q) : null;
  if (search) {
    // Nothing searchable (only short words or stopwords): match nothing rather than everything.
    where.push(search.boolean ? sql`MATCH (${entryRevisions.title}, ${entryRevisions.body}) AGAINST (${search.boolean} IN BOOLEAN MODE)` : sql`FALSE`);
  }
  const condition = and(...where);
  const attachmentCount = db
    .select({ n: count() })
    .from(attachments)
    .where(and(eq(attachments.entryId, entries.id), eq(attachments.state, "stored")));
  const rows = await db
    .select({
      id: entries.id,
      category: entries.category,
      title: entryRevisions.title,
      body: entryRevisions.body,
      authorId: entries.authorId,
      authorName: users.displayName,
      createdAt: entries.createdAt,
      updatedAt: entries.updatedAt,
      revision: entries.currentRevision,
      tags: entryRevisions.tags,
      runNumbers: entryRevisions.runNumbers,
      needsSafetyReview: entries.needsSafetyReview,
      retractedAt: entries.retractedAt,
      retractReason: entries.retractReason,
      attachmentCount: sql<number>`(${attachmentCount})`.mapWith(Number),
    })
    .from(entries)
    .innerJoin(entryRevisions, eq(entryRevisions.entryId, entries.id))
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(condition)
    .orderBy(desc(entries.createdAt), desc(entries.id))
    .limit(limit)
    .offset(offset);
  const [total] = await db
    .select({ n: count() })
    .from(entries)
    .innerJoin(entryRevisions, eq(entryRevisions.entryId, entries.id))
    .where(condition);
  return {
    items: rows.map(({ body, ...r }) => ({ ...r, excerpt: excerptOf(body) })),
    total: total?.n ?? 0,
    offset,
    limit,
    ignoredWords: search?.ignored ?? [],
  };
}

/** Everyone who has written an entry, by name (for the author filter). */
export async function feedAuthors(): Promise<{ id: number; name: string }[]> {
  return db
    .selectDistinct({ id: users.id, name: users.displayName })
    .from(users)
    .innerJoin(entries, eq(entries.authorId, users.id))
    .orderBy(users.displayName);
}

/** The most used tags, for suggestions in the filter. */
export async function popularTags(limit = 30): Promise<string[]> {
  const rows = await db
    .select({ tag: entryTags.tag, n: count() })
    .from(entryTags)
    .groupBy(entryTags.tag)
    .orderBy(desc(count()), entryTags.tag)
    .limit(limit);
  return rows.map((r) => r.tag);
}
