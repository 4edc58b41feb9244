import { NextResponse } from "next/server";
import { apiError, guardApi } from "@/lib/auth/guards";
import { getPeriod } from "@/db/periods";
import { loadPeriodsTotals } from "@/db/exposure";
import { CountingRequestError, getCounting, recordCounting } from "@/db/limits";
import { ExposureInputError, type PeriodTotals } from "@/lib/exposure";
import { BLIND_TEXT, periodLimitView, visibleInput } from "@/lib/limits-view";
import { countingPatchSchema, firstIssue, periodLimitQuerySchema } from "@/components/limits/inputs";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

async function periodId(ctx: Ctx): Promise<number | NextResponse> {
  const value = (await ctx.params).id;
  const id = Number(value);
  if (!Number.isInteger(id) || id <= 0) return apiError(400, `id: "${value}" is not a period id`, { field: "id", reason: "not a period id" });
  return id;
}

/**
 * GET /api/periods/{id}/limit?method=fc|classical|bayes&cl=0.9 (both default to the period's quoted ones) →
 * { period: { id, name }, method, cl, blind, state, observed, background, backgroundNote, acceptance,
 *   exposureKgDay, exposureTonneYear, exposureError?, limit: { kind, lower, upper, note? } | null,
 *   rate: { lowerPerKgDay, upperPerKgDay, lowerPerTonneYear, upperPerTonneYear } | null, rateNote, missing? }.
 * state is "computed", "awaiting" (n or b not recorded; `missing` names them) or "refused" (calculator limits,
 * with field and reason). A blind period answers 200 with blind: true, state "blind" and a message, and has no
 * observed, limit or rate keys at all: the count stays hidden until an unblinding is recorded.
 */
export async function GET(req: Request, ctx: Ctx) {
  const who = await guardApi(req, "periods.read");
  if (who instanceof NextResponse) return who;
  const id = await periodId(ctx);
  if (id instanceof NextResponse) return id;
  const params = new URL(req.url).searchParams;
  const query = periodLimitQuerySchema.safeParse({ method: params.get("method") ?? undefined, cl: params.get("cl") ?? undefined });
  if (!query.success) {
    const { error, field, reason } = firstIssue(query.error);
    return apiError(400, error, { field, reason });
  }
  const [period, counting] = await Promise.all([getPeriod(id), getCounting(id)]);
  if (!period || !counting) return apiError(404, `no period with id ${id}`, { field: "id", reason: "no such period" });
  const method = query.data.method ?? counting.limitMethod;
  const cl = query.data.cl ?? counting.confidenceLevel;
  let totals: PeriodTotals | null = null;
  let exposureError: string | undefined;
  try {
    totals = (await loadPeriodsTotals([period])).get(period.id) ?? null;
  } catch (err) {
    if (!(err instanceof ExposureInputError)) throw err;
    exposureError = err.message;
  }
  const common = {
    period: { id: period.id, name: period.name },
    method,
    cl,
    blind: period.blind,
    background: counting.expectedBackground,
    backgroundNote: counting.backgroundNote,
    acceptance: period.signalAcceptance,
    exposureKgDay: totals?.exposureKgDay ?? null,
    exposureTonneYear: totals?.exposureTonneYear ?? null,
    ...(exposureError ? { exposureError } : {}),
  };
  if (period.blind) return NextResponse.json({ ...common, state: "blind", message: BLIND_TEXT });
  const input = visibleInput({ ...counting, blind: period.blind, signalAcceptance: period.signalAcceptance, exposureKgDay: common.exposureKgDay });
  const view = periodLimitView(input, method, cl);
  const body = { ...common, observed: input.observed, state: view.state };
  if (view.state === "computed") {
    const { kind, lower, upper, note } = view.result;
    return NextResponse.json({ ...body, limit: { kind, lower, upper, ...(note ? { note } : {}) }, rate: view.rate, rateNote: view.rateNote });
  }
  if (view.state === "refused") return NextResponse.json({ ...body, limit: null, rate: null, rateNote: null, field: view.field, reason: view.reason });
  return NextResponse.json({ ...body, limit: null, rate: null, rateNote: null, missing: view.state === "awaiting" ? view.missing : [] });
}

/**
 * PATCH /api/periods/{id}/limit { observed?, background?, backgroundNote?, cl?, method? } (null clears) →
 * { counting } without the count while blind. Analysis conveners only ("limits.record"); audited. 409 with
 * field "observed" when the period is blind; 400 { error, field, reason } on bad input or a background
 * without a note.
 */
export async function PATCH(req: Request, ctx: Ctx) {
  const who = await guardApi(req, "limits.record");
  if (who instanceof NextResponse) return who;
  if (who.kind !== "user") return apiError(403, "counts and backgrounds are recorded by people, not machine tokens");
  const id = await periodId(ctx);
  if (id instanceof NextResponse) return id;
  let raw: unknown;
  try {
    raw = await req.json();
  } catch {
    return apiError(400, "body: the request body must be JSON", { field: "body", reason: "the request body must be JSON" });
  }
  const parsed = countingPatchSchema.safeParse(raw);
  if (!parsed.success) {
    const { error, field, reason } = firstIssue(parsed.error);
    return apiError(400, error, { field, reason });
  }
  try {
    const saved = await recordCounting(who.id, id, parsed.data);
    const { observedCount, ...rest } = saved;
    return NextResponse.json({ counting: saved.blind ? rest : { ...rest, observedCount } });
  } catch (err) {
    if (err instanceof CountingRequestError) return apiError(err.status, err.message, { code: err.code, field: err.field, reason: err.reason });
    throw err;
  }
}
