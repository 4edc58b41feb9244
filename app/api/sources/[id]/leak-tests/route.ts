import { NextResponse } from "next/server";
import { recordLeakTest } from "@/db/sources";
import { actorOf, apiError, guardApi } from "@/lib/auth/guards";
import { idParam, jsonBody, parseOr400 } from "../../../safety/http";
import { leakTestSchema } from "../../schemas";
import { sourceErrorResponse } from "../../respond";

export const dynamic = "force-dynamic";

/** POST /api/sources/{id}/leak-tests {testedAt, result?} → 200 {id, lastLeakTestAt}. */
export async function POST(req: Request, { params }: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "sources.manage");
  if (who instanceof NextResponse) return who;
  const id = idParam((await params).id);
  if (id === null) return apiError(404, "no such source");
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(leakTestSchema, raw);
  if (input instanceof NextResponse) return input;
  try {
    await recordLeakTest(actorOf(who), id, input.testedAt, input.result);
    return NextResponse.json({ id, lastLeakTestAt: input.testedAt.toISOString() });
  } catch (err) {
    return sourceErrorResponse(err);
  }
}
