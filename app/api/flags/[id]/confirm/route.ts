import { NextResponse } from "next/server";
import { guardApi } from "@/lib/auth/guards";
import { confirmFlag } from "@/db/flags";
import { flagConfirmSchema } from "@/components/quality/inputs";
import { knownError, pathId, readBody, userOnly } from "../../_http";

export const dynamic = "force-dynamic";

/**
 * POST /api/flags/{id}/confirm { comment? } → { flag } (state "confirmed").
 * 403 { code: "own_flag" } when the proposer tries (two-person rule); 409 when the flag is no longer proposed.
 */
export async function POST(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "flags.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const body = await readBody(req, flagConfirmSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ flag: await confirmFlag(actorId, id, body.comment) });
  } catch (err) {
    return knownError(err);
  }
}
