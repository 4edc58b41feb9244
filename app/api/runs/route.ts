import { NextResponse } from "next/server";
import { listRuns } from "@/db/runs";
import { openRun } from "@/db/run-writes";
import { actorOf, guardApi } from "@/lib/auth/guards";
import { parseListQuery, parseOpenRequest } from "@/lib/runs";
import { jsonBody, runErrorResponse, writeReply } from "./respond";

export const dynamic = "force-dynamic";

/**
 * GET /api/runs?type=&status=&from=&to=&cursor=&limit=: runs newest first by (start, id), start in [from, to),
 * at most `limit` (≤ 200, default 50) a page; `nextCursor` fetches the next, older page.
 */
export async function GET(req: Request) {
  const who = await guardApi(req, "runs.read");
  if (who instanceof NextResponse) return who;
  try {
    return NextResponse.json(await listRuns(parseListQuery(new URL(req.url).searchParams)));
  } catch (err) {
    return runErrorResponse(err);
  }
}

/**
 * POST /api/runs {number, type, start, detector?, conditions?, targetMassOverrideKg?}: open a run.
 * 201 when opened; 200 with the same body when it repeats an earlier open; 409 when the number is taken by a
 * run with different content; 400 naming the field for bad input.
 */
export async function POST(req: Request) {
  const who = await guardApi(req, "runs.write");
  if (who instanceof NextResponse) return who;
  try {
    const input = parseOpenRequest(await jsonBody(req));
    const { run, changed } = await openRun(actorOf(who), input);
    return writeReply({ run }, changed ? 201 : 200, !changed);
  } catch (err) {
    return runErrorResponse(err);
  }
}
