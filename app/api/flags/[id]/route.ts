import { NextResponse } from "next/server";
import { apiError, guardApi } from "@/lib/auth/guards";
import { flagHistory, getFlag } from "@/db/flags";
import { pathId } from "../_http";

export const dynamic = "force-dynamic";

/** GET /api/flags/{id} → { flag, history: [{ action, actor, comment, at }] }. */
export async function GET(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "flags.read");
  if (who instanceof NextResponse) return who;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const flag = await getFlag(id);
  if (!flag) return apiError(404, `no flag with id ${id}`, { field: "id" });
  return NextResponse.json({ flag, history: await flagHistory(id) });
}
