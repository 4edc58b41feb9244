import { NextResponse } from "next/server";
import { listCheckouts, returnSource } from "@/db/sources";
import { apiError, guardApi } from "@/lib/auth/guards";
import { idParam, jsonBody, parseOr400 } from "../../../../../safety/http";
import { returnSchema } from "../../../../schemas";
import { sourceErrorResponse } from "../../../../respond";

export const dynamic = "force-dynamic";

/** POST /api/sources/{id}/checkouts/{checkoutId}/return {returnedAt?} → 200 {id, returnedAt}. */
export async function POST(req: Request, { params }: { params: Promise<{ id: string; checkoutId: string }> }) {
  const who = await guardApi(req, "sources.checkout");
  if (who instanceof NextResponse) return who;
  if (who.kind !== "user") return apiError(403, "a person returns sources, not a machine token");
  const p = await params;
  const sourceId = idParam(p.id);
  const checkoutId = idParam(p.checkoutId);
  if (sourceId === null || checkoutId === null) return apiError(404, "no such checkout");
  const mine = await listCheckouts({ sourceId });
  if (!mine.some((c) => c.id === checkoutId)) return apiError(404, "no such checkout of this source");
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(returnSchema, raw);
  if (input instanceof NextResponse) return input;
  const at = input.returnedAt ?? new Date();
  try {
    await returnSource({ userId: who.id }, checkoutId, at);
    return NextResponse.json({ id: checkoutId, returnedAt: at.toISOString() });
  } catch (err) {
    return sourceErrorResponse(err);
  }
}
