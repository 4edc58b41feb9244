import { NextResponse } from "next/server";
import { guardApi } from "@/lib/auth/guards";
import { createPeriod, listPeriods } from "@/db/periods";
import { loadPeriodsTotals } from "@/db/exposure";
import { periodCreateSchema } from "@/components/quality/inputs";
import { ExposureInputError } from "@/lib/exposure";
import { knownError, readBody, userOnly } from "../flags/_http";

export const dynamic = "force-dynamic";

/**
 * GET /api/periods → { periods: [{ id, name, startAt, endAt, runTypes, signalAcceptance, notes, blind, totals }] },
 * totals = { runs, liveSeconds, goodLiveSeconds, lostLiveSeconds, exposureKgDay, exposureTonneYear, openRuns }
 * (null with `exposureError` when the ledger cannot be computed).
 */
export async function GET(req: Request) {
  const who = await guardApi(req, "periods.read");
  if (who instanceof NextResponse) return who;
  const periods = await listPeriods();
  let totals = new Map();
  let exposureError: string | undefined;
  try {
    totals = await loadPeriodsTotals(periods);
  } catch (err) {
    if (!(err instanceof ExposureInputError)) throw err;
    exposureError = err.message;
  }
  return NextResponse.json({
    periods: periods.map((p) => ({ ...p, totals: totals.get(p.id) ?? null })),
    ...(exposureError ? { exposureError } : {}),
  });
}

/** POST /api/periods { name, startAt, endAt (ISO with zone), runTypes[], signalAcceptance 0–1, notes?, blind? } → 201 { period }. */
export async function POST(req: Request) {
  const who = await guardApi(req, "periods.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const body = await readBody(req, periodCreateSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ period: await createPeriod(actorId, body) }, { status: 201 });
  } catch (err) {
    return knownError(err);
  }
}
