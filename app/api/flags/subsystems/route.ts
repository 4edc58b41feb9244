import { NextResponse } from "next/server";
import { guardApi } from "@/lib/auth/guards";
import { createSubsystem, listSubsystems } from "@/db/flags";
import { subsystemSchema } from "@/components/quality/inputs";
import { knownError, readBody, userOnly } from "../_http";

export const dynamic = "force-dynamic";

/** GET /api/flags/subsystems?all=1 → { subsystems: [{ code, label, active }] } (active only unless all=1). */
export async function GET(req: Request) {
  const who = await guardApi(req, "flags.read");
  if (who instanceof NextResponse) return who;
  const all = new URL(req.url).searchParams.get("all") === "1";
  return NextResponse.json({ subsystems: await listSubsystems(all) });
}

/** POST /api/flags/subsystems { code, label } → 201 { subsystem }; 409 if the code exists. */
export async function POST(req: Request) {
  const who = await guardApi(req, "flags.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const body = await readBody(req, subsystemSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ subsystem: await createSubsystem(actorId, body) }, { status: 201 });
  } catch (err) {
    return knownError(err);
  }
}
