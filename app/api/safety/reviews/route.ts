import { NextResponse } from "next/server";
import { z } from "zod";
import { listQueue, queueCounts, getQueueItem } from "@/db/safety";
import { ENTRY_CATEGORIES } from "@/db/schema";
import { guardApi } from "@/lib/auth/guards";
import { OPEN_STATES, REVIEW_STATES } from "@/components/safety/review-flow";
import { parseOr400 } from "../http";

export const dynamic = "force-dynamic";

const query = z.object({
  // "open" (default): awaiting review and follow-up needed; "all"; or one state.
  state: z.enum(["open", "all", ...REVIEW_STATES]).default("open"),
  category: z.enum(ENTRY_CATEGORIES).optional(),
  entryId: z.coerce.number().int().positive().optional(),
});

/** GET /api/safety/reviews?state=open|all|<state>&category=&entryId=: queue items oldest first, and counts by state. */
export async function GET(req: Request) {
  const who = await guardApi(req, "safety.review");
  if (who instanceof NextResponse) return who;
  const q = parseOr400(query, Object.fromEntries(new URL(req.url).searchParams));
  if (q instanceof NextResponse) return q;
  const now = Date.now();
  if (q.entryId !== undefined) {
    const item = await getQueueItem({ entryId: q.entryId });
    return NextResponse.json({ items: item ? [{ ...item, ageMs: now - item.enteredAt.getTime() }] : [], counts: await queueCounts() });
  }
  const states = q.state === "all" ? undefined : q.state === "open" ? OPEN_STATES : [q.state];
  const items = await listQueue({ ...(states ? { states } : {}), ...(q.category ? { category: q.category } : {}) });
  return NextResponse.json({ items: items.map((i) => ({ ...i, ageMs: now - i.enteredAt.getTime() })), counts: await queueCounts() });
}
