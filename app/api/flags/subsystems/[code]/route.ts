import { NextResponse } from "next/server";
import { z } from "zod";
import { guardApi } from "@/lib/auth/guards";
import { setSubsystemActive } from "@/db/flags";
import { knownError, readBody, userOnly } from "../../_http";

export const dynamic = "force-dynamic";

const patchSchema = z.object({ active: z.boolean({ message: "must be true or false" }) });

/** PATCH /api/flags/subsystems/{code} { active } → { subsystem } (deactivated subsystems are not offered for new flags). */
export async function PATCH(req: Request, ctx: { params: Promise<{ code: string }> }) {
  const who = await guardApi(req, "flags.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const body = await readBody(req, patchSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ subsystem: await setSubsystemActive(actorId, (await ctx.params).code, body.active) });
  } catch (err) {
    return knownError(err);
  }
}
