import { NextResponse } from "next/server";
import { createEntry } from "@/db/entries";
import { listFeed } from "@/db/entry-feed";
import { apiError, guardApi } from "@/lib/auth/guards";
import { afterEntrySaved } from "@/lib/server/entry-hooks";
import { createEntrySchema, firstIssue } from "@/components/logbook/entry-schema";
import { readFeedQuery, toFeedFilters } from "@/components/logbook/feed-query";
import { errorResponse, jsonBody, writerId } from "./respond";
import { runEntryHook } from "./hook";

export const dynamic = "force-dynamic";

/** GET /api/entries: the feed, newest first; filters q, category, author, run, tag, from, to, limit, offset. */
export async function GET(req: Request) {
  const who = await guardApi(req, "entries.read");
  if (who instanceof NextResponse) return who;
  const query = readFeedQuery(new URL(req.url).searchParams);
  if (!query.success) return apiError(400, firstIssue(query.error).error, { field: firstIssue(query.error).field });
  const page = await listFeed(toFeedFilters(query.data));
  return NextResponse.json({ entries: page.items, total: page.total, offset: page.offset, limit: page.limit, ignoredWords: page.ignoredWords });
}

/** POST /api/entries {category, title, body, tags, runNumbers, needsSafetyReview} → 201 {id, revision: 1}. */
export async function POST(req: Request) {
  const who = await guardApi(req, "entries.write");
  if (who instanceof NextResponse) return who;
  const userId = writerId(who);
  if (userId instanceof NextResponse) return userId;
  const body = await jsonBody(req);
  if (body instanceof NextResponse) return body;
  const parsed = createEntrySchema.safeParse(body);
  if (!parsed.success) return apiError(400, firstIssue(parsed.error).error, { field: firstIssue(parsed.error).field });
  try {
    const saved = await createEntry({ userId }, parsed.data);
    const warning = await runEntryHook(afterEntrySaved, saved);
    return NextResponse.json(
      { id: saved.entryId, revision: saved.revision, ...(warning ? { warning } : {}) },
      { status: 201, headers: { location: `/api/entries/${saved.entryId}` } },
    );
  } catch (err) {
    return errorResponse(err);
  }
}
