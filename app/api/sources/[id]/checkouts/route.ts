import { NextResponse } from "next/server";
import { checkOut, existingRunNumbers } from "@/db/sources";
import { apiError, guardApi } from "@/lib/auth/guards";
import { idParam, jsonBody, parseOr400 } from "../../../safety/http";
import { checkoutSchema } from "../../schemas";
import { sourceErrorResponse, unknownRunsResponse } from "../../respond";

export const dynamic = "force-dynamic";

/** POST /api/sources/{id}/checkouts {purpose, checkedOutAt?, runNumbers?} → 201 {id} (people only, not machine tokens). */
export async function POST(req: Request, { params }: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "sources.checkout");
  if (who instanceof NextResponse) return who;
  if (who.kind !== "user") return apiError(403, "a person checks sources out, not a machine token");
  const id = idParam((await params).id);
  if (id === null) return apiError(404, "no such source");
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(checkoutSchema, raw);
  if (input instanceof NextResponse) return input;
  const unknown = unknownRunsResponse(input.runNumbers, await existingRunNumbers(input.runNumbers));
  if (unknown) return unknown;
  try {
    const checkoutId = await checkOut({ userId: who.id }, id, { at: input.checkedOutAt ?? new Date(), purpose: input.purpose, runNumbers: input.runNumbers });
    return NextResponse.json({ id: checkoutId }, { status: 201 });
  } catch (err) {
    return sourceErrorResponse(err);
  }
}
