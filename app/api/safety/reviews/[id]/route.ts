import { NextResponse } from "next/server";
import { getQueueItem, reviewEvents } from "@/db/safety";
import { apiError, guardApi } from "@/lib/auth/guards";
import { REVIEW_MOVES } from "@/components/safety/review-flow";
import { idParam } from "../../http";

export const dynamic = "force-dynamic";

/** GET /api/safety/reviews/{id}: the item, its trail of moves and the moves allowed next. */
export async function GET(req: Request, { params }: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "safety.review");
  if (who instanceof NextResponse) return who;
  const id = idParam((await params).id);
  const item = id === null ? null : await getQueueItem({ reviewId: id });
  if (!item) return apiError(404, "no such review item");
  return NextResponse.json({ item, events: await reviewEvents(item.reviewId), moves: REVIEW_MOVES[item.state] });
}
