import { NextResponse } from "next/server";
import { createSource, listCheckouts, listSources } from "@/db/sources";
import { actorOf, guardApi } from "@/lib/auth/guards";
import { describeSource } from "@/components/safety/source-status";
import { jsonBody, parseOr400 } from "../safety/http";
import { newSourceSchema } from "./schemas";
import { sourceErrorResponse } from "./respond";

export const dynamic = "force-dynamic";

/** GET /api/sources: the inventory with today's activity, checkout and leak-test state of each source. */
export async function GET(req: Request) {
  const who = await guardApi(req, "sources.read");
  if (who instanceof NextResponse) return who;
  const now = Date.now();
  const open = await listCheckouts({ openOnly: true });
  const sources = (await listSources()).map((s) => {
    const mine = open.filter((c) => c.sourceId === s.id).map((c) => ({ id: c.id, checkedOutMs: c.checkedOutAt.getTime(), returnedMs: null }));
    return { ...s, ...describeSource(s, mine, now) };
  });
  return NextResponse.json({ sources });
}

/** POST /api/sources {nuclide, serial, form?, referenceActivityBq, referenceDate, location, allowedOutHours, ...} → 201 {id}. */
export async function POST(req: Request) {
  const who = await guardApi(req, "sources.manage");
  if (who instanceof NextResponse) return who;
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(newSourceSchema, raw);
  if (input instanceof NextResponse) return input;
  try {
    return NextResponse.json({ id: await createSource(actorOf(who), input) }, { status: 201 });
  } catch (err) {
    return sourceErrorResponse(err);
  }
}
