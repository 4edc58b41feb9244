import { NextResponse } from "next/server";
import { getEntry, reviseEntry } from "@/db/entries";
import { apiError, guardApi } from "@/lib/auth/guards";
import { afterEntrySaved } from "@/lib/server/entry-hooks";
import { firstIssue, reviseEntrySchema } from "@/components/logbook/entry-schema";
import { errorResponse, idFrom, jsonBody, writerId } from "../respond";
import { runEntryHook } from "../hook";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

/** GET /api/entries/{id}: the entry, its current text and every revision (oldest first), and its attachments. */
export async function GET(req: Request, ctx: Ctx) {
  const who = await guardApi(req, "entries.read");
  if (who instanceof NextResponse) return who;
  const id = idFrom((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const entry = await getEntry(id);
  if (!entry) return apiError(404, `there is no entry ${id}`);
  return NextResponse.json(entry);
}

/**
 * PUT /api/entries/{id} {baseRevision, title, body, tags, runNumbers, category?, needsSafetyReview?} → 200 {revision};
 * 409 {error, currentRevision} when baseRevision is no longer the newest.
 */
export async function PUT(req: Request, ctx: Ctx) {
  const who = await guardApi(req, "entries.write");
  if (who instanceof NextResponse) return who;
  const userId = writerId(who);
  if (userId instanceof NextResponse) return userId;
  const id = idFrom((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const body = await jsonBody(req);
  if (body instanceof NextResponse) return body;
  const parsed = reviseEntrySchema.safeParse(body);
  if (!parsed.success) return apiError(400, firstIssue(parsed.error).error, { field: firstIssue(parsed.error).field });
  try {
    const saved = await reviseEntry({ userId }, id, parsed.data);
    const warning = await runEntryHook(afterEntrySaved, saved);
    return NextResponse.json({ id, revision: saved.revision, ...(warning ? { warning } : {}) });
  } catch (err) {
    return errorResponse(err);
  }
}
