import { NextResponse } from "next/server";
import { getRunDetail } from "@/db/runs";
import { closeRun } from "@/db/run-writes";
import { actorOf, guardApi } from "@/lib/auth/guards";
import { parseCloseRequest, RunNotFoundError } from "@/lib/runs";
import { jsonBody, runErrorResponse, runNumberParam, writeReply } from "../respond";

export const dynamic = "force-dynamic";

type Params = { params: Promise<{ number: string }> };

/** GET /api/runs/{number}: one run with conditions, configuration, quality and linked logbook entries. */
export async function GET(req: Request, { params }: Params) {
  const who = await guardApi(req, "runs.read");
  if (who instanceof NextResponse) return who;
  try {
    const number = runNumberParam((await params).number);
    const run = await getRunDetail(number);
    if (!run) throw new RunNotFoundError(number);
    return NextResponse.json({ run });
  } catch (err) {
    return runErrorResponse(err);
  }
}

/**
 * PATCH /api/runs/{number} {end, liveSeconds, deadSeconds, triggerCount, status?: "ended"|"aborted"}: close a run.
 * 200 when closed, and 200 with the same body when it repeats the close that was recorded; 409 when the run is
 * already closed with different values; 400 naming the field for bad input; 404 for an unknown run.
 */
export async function PATCH(req: Request, { params }: Params) {
  const who = await guardApi(req, "runs.write");
  if (who instanceof NextResponse) return who;
  try {
    const number = runNumberParam((await params).number);
    const input = parseCloseRequest(await jsonBody(req));
    const { run, changed } = await closeRun(actorOf(who), number, input);
    return writeReply({ run }, 200, !changed);
  } catch (err) {
    return runErrorResponse(err);
  }
}
