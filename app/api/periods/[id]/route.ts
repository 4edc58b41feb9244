import { NextResponse } from "next/server";
import { apiError, guardApi } from "@/lib/auth/guards";
import { getPeriod, updatePeriod } from "@/db/periods";
import { periodPatchSchema } from "@/components/quality/inputs";
import { knownError, pathId, readBody, userOnly } from "../../flags/_http";

export const dynamic = "force-dynamic";

/** GET /api/periods/{id} → { period } (the definition; exposure is at /api/periods/{id}/exposure). */
export async function GET(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "periods.read");
  if (who instanceof NextResponse) return who;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const period = await getPeriod(id);
  if (!period) return apiError(404, `no period with id ${id}`, { field: "id" });
  return NextResponse.json({ period });
}

/**
 * PATCH /api/periods/{id} { any of name, startAt, endAt, runTypes, signalAcceptance, notes, blind } → { period }.
 * Setting blind from true to false is refused (409): unblinding is recorded on the limits page.
 */
export async function PATCH(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "periods.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const body = await readBody(req, periodPatchSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ period: await updatePeriod(actorId, id, body) });
  } catch (err) {
    return knownError(err);
  }
}
