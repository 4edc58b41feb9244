import { NextResponse } from "next/server";
import { guardApi } from "@/lib/auth/guards";
import { withdrawFlag } from "@/db/flags";
import { flagWithdrawSchema } from "@/components/quality/inputs";
import { knownError, pathId, readBody, userOnly } from "../../_http";

export const dynamic = "force-dynamic";

/** POST /api/flags/{id}/withdraw { reason } → { flag } (state "withdrawn"); 409 if already withdrawn. */
export async function POST(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "flags.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const body = await readBody(req, flagWithdrawSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ flag: await withdrawFlag(actorId, id, body.reason) });
  } catch (err) {
    return knownError(err);
  }
}
