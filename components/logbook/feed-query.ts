/** The feed's filters as URL query parameters (the /logbook page and GET /api/entries read the same ones). */
import { z } from "zod";
import { ENTRY_CATEGORIES } from "@/db/schema/logbook";
import type { FeedFilters } from "@/db/entry-feed";

const DAY_MS = 86_400_000;
const empty = (v: unknown) => (v === "" || v === null ? undefined : v);
const day = z.preprocess(empty, z.iso.date("Use a date like 2025-03-04").optional());

/** Query parameters of the feed: q, category, author, run, tag, from, to (UTC dates, inclusive), limit, offset. */
export const feedQuerySchema = z.object({
  q: z.preprocess(empty, z.string().trim().max(200).optional()),
  category: z.preprocess(empty, z.enum(ENTRY_CATEGORIES, { error: "Unknown category" }).optional()),
  author: z.preprocess(empty, z.coerce.number().int().positive("Pick an author from the list").optional()),
  run: z.preprocess(empty, z.coerce.number({ error: "A run number is a whole number" }).int().positive("A run number is a whole number from 1").optional()),
  tag: z.preprocess(empty, z.string().trim().toLowerCase().max(60).optional()),
  from: day,
  to: day,
  limit: z.preprocess(empty, z.coerce.number().int().min(1).max(200).optional()),
  offset: z.preprocess(empty, z.coerce.number().int().min(0).optional()),
});
export type FeedQuery = z.infer<typeof feedQuerySchema>;

/** Read the filters from URL parameters (a record or URLSearchParams); first value wins for repeated keys. */
export function readFeedQuery(params: URLSearchParams | Record<string, string | string[] | undefined>) {
  const record: Record<string, string | undefined> = {};
  if (params instanceof URLSearchParams) {
    for (const key of params.keys()) record[key] ??= params.get(key) ?? undefined;
  } else {
    for (const [key, value] of Object.entries(params)) record[key] = Array.isArray(value) ? value[0] : value;
  }
  return feedQuerySchema.safeParse(record);
}

/** Turn parsed query parameters into database filters; "to" includes the whole named day. */
export function toFeedFilters(q: FeedQuery): FeedFilters {
  return {
    q: q.q,
    category: q.category,
    authorId: q.author,
    runNumber: q.run,
    tag: q.tag,
    from: q.from ? new Date(`${q.from}T00:00:00Z`) : undefined,
    until: q.to ? new Date(Date.parse(`${q.to}T00:00:00Z`) + DAY_MS) : undefined,
    limit: q.limit,
    offset: q.offset,
  };
}
