import { NextResponse } from "next/server";
import { retractEntry } from "@/db/entries";
import { apiError, guardApi } from "@/lib/auth/guards";
import { firstIssue, retractSchema } from "@/components/logbook/entry-schema";
import { errorResponse, idFrom, jsonBody, writerId } from "../../respond";

export const dynamic = "force-dynamic";

/** POST /api/entries/{id}/retract {reason} → 200 {id, retracted: true}; admins only ("entries.retract"). */
export async function POST(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "entries.retract");
  if (who instanceof NextResponse) return who;
  const userId = writerId(who);
  if (userId instanceof NextResponse) return userId;
  const id = idFrom((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const body = await jsonBody(req);
  if (body instanceof NextResponse) return body;
  const parsed = retractSchema.safeParse(body);
  if (!parsed.success) return apiError(400, firstIssue(parsed.error).error, { field: firstIssue(parsed.error).field });
  try {
    await retractEntry({ userId }, id, parsed.data.reason);
    return NextResponse.json({ id, retracted: true, reason: parsed.data.reason });
  } catch (err) {
    return errorResponse(err);
  }
}
