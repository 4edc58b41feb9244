import { NextResponse } from "next/server";
import { existingRunNumbers, listCheckouts, setCheckoutRuns } from "@/db/sources";
import { actorOf, apiError, guardApi } from "@/lib/auth/guards";
import { idParam, jsonBody, parseOr400 } from "../../../../../safety/http";
import { runsSchema } from "../../../../schemas";
import { sourceErrorResponse, unknownRunsResponse } from "../../../../respond";

export const dynamic = "force-dynamic";

/** PUT /api/sources/{id}/checkouts/{checkoutId}/runs {runNumbers} → 200 {id, runNumbers}: the calibration runs it served. */
export async function PUT(req: Request, { params }: { params: Promise<{ id: string; checkoutId: string }> }) {
  const who = await guardApi(req, "sources.checkout");
  if (who instanceof NextResponse) return who;
  const p = await params;
  const sourceId = idParam(p.id);
  const checkoutId = idParam(p.checkoutId);
  if (sourceId === null || checkoutId === null) return apiError(404, "no such checkout");
  if (!(await listCheckouts({ sourceId })).some((c) => c.id === checkoutId)) return apiError(404, "no such checkout of this source");
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(runsSchema, raw);
  if (input instanceof NextResponse) return input;
  const unknown = unknownRunsResponse(input.runNumbers, await existingRunNumbers(input.runNumbers));
  if (unknown) return unknown;
  try {
    await setCheckoutRuns(actorOf(who), checkoutId, input.runNumbers);
    return NextResponse.json({ id: checkoutId, runNumbers: [...new Set(input.runNumbers)].sort((a, b) => a - b) });
  } catch (err) {
    return sourceErrorResponse(err);
  }
}
