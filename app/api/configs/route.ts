import { NextResponse } from "next/server";
import { createConfig, listConfigs } from "@/db/configs";
import { actorOf, guardApi } from "@/lib/auth/guards";
import { parseConfigRequest } from "@/lib/runs";
import { jsonBody, runErrorResponse } from "../runs/respond";

export const dynamic = "force-dynamic";

/** GET /api/configs: every detector configuration, by detector and effective time. */
export async function GET(req: Request) {
  const who = await guardApi(req, "runs.read");
  if (who instanceof NextResponse) return who;
  return NextResponse.json({ configs: await listConfigs() });
}

/**
 * POST /api/configs {detector, name, targetMaterial, fiducialMassKg, effectiveFrom, notes?}: add a configuration
 * (detector experts). 201 with its id and how many recorded runs moved onto it; 409 if one of that detector
 * already takes effect at the same instant.
 */
export async function POST(req: Request) {
  const who = await guardApi(req, "configs.manage");
  if (who instanceof NextResponse) return who;
  try {
    const input = parseConfigRequest(await jsonBody(req));
    const { id, reassignedRuns } = await createConfig(actorOf(who), input);
    const config = (await listConfigs()).find((c) => c.id === id);
    return NextResponse.json({ config, reassignedRuns }, { status: 201 });
  } catch (err) {
    return runErrorResponse(err);
  }
}
