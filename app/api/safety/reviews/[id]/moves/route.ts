import { NextResponse } from "next/server";
import { z } from "zod";
import { moveReview, ReviewNotFoundError } from "@/db/safety";
import { actorOf, apiError, guardApi } from "@/lib/auth/guards";
import { ReviewMoveError, REVIEW_STATES } from "@/components/safety/review-flow";
import { notifyFollowUp } from "@/lib/server/safety-jobs";
import { idParam, jsonBody, parseOr400 } from "../../../http";

export const dynamic = "force-dynamic";

const body = z.object({
  to: z.enum(REVIEW_STATES, "pick the state to move to"),
  comment: z.string("write a comment saying what was checked").trim().min(1, "write a comment saying what was checked").max(4000),
});

/** POST /api/safety/reviews/{id}/moves {to, comment}: a safety officer moves the item → 200 {id, from, state}. */
export async function POST(req: Request, { params }: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "safety.review");
  if (who instanceof NextResponse) return who;
  const id = idParam((await params).id);
  if (id === null) return apiError(404, "no such review item");
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(body, raw);
  if (input instanceof NextResponse) return input;
  try {
    const moved = await moveReview(actorOf(who), id, input.to, input.comment);
    if (moved.to === "follow_up") await notifyFollowUp(id, who.name, moved.comment);
    return NextResponse.json({ id, from: moved.from, state: moved.to });
  } catch (err) {
    if (err instanceof ReviewNotFoundError) return apiError(404, err.message);
    if (err instanceof ReviewMoveError) return apiError(err.code === "NOT_ALLOWED" ? 409 : 400, err.message, { field: err.field });
    throw err;
  }
}
