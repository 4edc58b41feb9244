import { NextResponse } from "next/server";
import { getSource, listCheckouts, runsOverlapping, updateSource } from "@/db/sources";
import { actorOf, apiError, guardApi } from "@/lib/auth/guards";
import { decayWaits, describeSource, factsFromRow, scienceRunsInsideWaits } from "@/components/safety/source-status";
import { idParam, jsonBody, parseOr400 } from "../../safety/http";
import { sourceChangesSchema } from "../schemas";
import { sourceErrorResponse } from "../respond";

export const dynamic = "force-dynamic";

/** GET /api/sources/{id}: the source, its state now, its checkouts (with runs), decay waits and science runs inside them. */
export async function GET(req: Request, { params }: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "sources.read");
  if (who instanceof NextResponse) return who;
  const id = idParam((await params).id);
  const source = id === null ? null : await getSource(id);
  if (!source) return apiError(404, "no such source");
  const now = Date.now();
  const checkouts = await listCheckouts({ sourceId: source.id });
  const facts = checkouts.map((c) => ({ id: c.id, checkedOutMs: c.checkedOutAt.getTime(), returnedMs: c.returnedAt?.getTime() ?? null }));
  const waits = decayWaits(factsFromRow(source), facts);
  let insideWaits: ReturnType<typeof scienceRunsInsideWaits> = [];
  if (waits.length) {
    const first = waits[0]!;
    const last = waits[waits.length - 1]!;
    const runs = await runsOverlapping(new Date(first.injectedMs), new Date(Math.max(...waits.map((w) => w.waitEndMs), last.injectedMs)), ["science"]);
    insideWaits = scienceRunsInsideWaits(runs.map((r) => ({ number: r.number, type: r.type, startMs: r.startAt.getTime(), endMs: r.endAt?.getTime() ?? null })), waits, now);
  }
  return NextResponse.json({
    source: { ...source, ...describeSource(source, facts, now) },
    checkouts,
    decayWaits: waits.map((w) => ({ ...w, injectedAt: new Date(w.injectedMs).toISOString(), waitEndsAt: new Date(w.waitEndMs).toISOString() })),
    scienceRunsInsideWaits: insideWaits.map((x) => ({ runNumber: x.run.number, checkoutId: x.wait.checkoutId, label: "inside decay wait" })),
  });
}

/** PATCH /api/sources/{id} {location?, custodianId?, allowedOutHours?, leakTestIntervalMonths?, decayWaitFraction?, notes?} → 200 {id}. */
export async function PATCH(req: Request, { params }: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "sources.manage");
  if (who instanceof NextResponse) return who;
  const id = idParam((await params).id);
  if (id === null) return apiError(404, "no such source");
  const raw = await jsonBody(req);
  if (raw instanceof NextResponse) return raw;
  const input = parseOr400(sourceChangesSchema, raw);
  if (input instanceof NextResponse) return input;
  const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
  try {
    await updateSource(actorOf(who), id, changes);
    return NextResponse.json({ id });
  } catch (err) {
    return sourceErrorResponse(err);
  }
}
