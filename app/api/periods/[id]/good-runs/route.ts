import { NextResponse } from "next/server";
import { apiError, guardApi } from "@/lib/auth/guards";
import { getPeriod } from "@/db/periods";
import { loadPeriodReport } from "@/db/exposure";
import { exportFileName, goodRunList, goodRunsCsv } from "@/components/exposure/csv";
import { knownError, pathId } from "../../../flags/_http";

export const dynamic = "force-dynamic";

/**
 * GET /api/periods/{id}/good-runs?format=json|csv
 * json → { period, formula, goodRuns: [{ runNumber, goodIntervals: [{ start, end }], goodLiveSeconds }], totals };
 * csv  → run_number, good_intervals_utc (ISO 8601 "start/end", space-separated), good_live_s.
 */
export async function GET(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "periods.read");
  if (who instanceof NextResponse) return who;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const format = new URL(req.url).searchParams.get("format") ?? "json";
  if (format !== "json" && format !== "csv") return apiError(400, `format: must be json or csv (got "${format}")`, { field: "format" });
  const period = await getPeriod(id);
  if (!period) return apiError(404, `no period with id ${id}`, { field: "id" });
  let report;
  try {
    ({ report } = await loadPeriodReport(period));
  } catch (err) {
    return knownError(err);
  }
  const goodRuns = goodRunList(report);
  const filename = exportFileName(period.name, period.id, "good-runs", format);
  const disposition = `attachment; filename="${filename}"`;
  if (format === "csv") {
    return new NextResponse(goodRunsCsv(goodRuns), {
      headers: { "content-type": "text/csv; charset=utf-8; header=present", "content-disposition": disposition },
    });
  }
  return NextResponse.json(
    { period: report.period, formula: report.formula, goodRuns, totals: report.totals, computedAt: report.computedAt },
    { headers: { "content-disposition": disposition } },
  );
}
