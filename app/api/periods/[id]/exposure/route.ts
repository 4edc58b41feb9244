import { NextResponse } from "next/server";
import { apiError, guardApi } from "@/lib/auth/guards";
import { getPeriod } from "@/db/periods";
import { loadPeriodReport } from "@/db/exposure";
import { exportFileName, exposureCsv } from "@/components/exposure/csv";
import { knownError, pathId } from "../../../flags/_http";

export const dynamic = "force-dynamic";

/**
 * GET /api/periods/{id}/exposure?format=json|csv[&runs=none]
 * json → ExposureReport { period, formula, totals, runs[] (arithmetic per run), runsOmitted, openRuns[], preview, computedAt }
 *        (runs=none: the summary only, runs[] empty and runsOmitted = the count);
 * csv  → one `run` line per counted run, `open` lines, one `total` line (see components/exposure/csv.ts).
 */
export async function GET(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const who = await guardApi(req, "periods.read");
  if (who instanceof NextResponse) return who;
  const id = pathId((await ctx.params).id);
  if (id instanceof NextResponse) return id;
  const params = new URL(req.url).searchParams;
  const format = params.get("format") ?? "json";
  const rows = params.get("runs") ?? "all";
  if (rows !== "all" && rows !== "none") return apiError(400, `runs: must be all or none (got "${rows}")`, { field: "runs" });
  if (format !== "json" && format !== "csv") return apiError(400, `format: must be json or csv (got "${format}")`, { field: "format" });
  const period = await getPeriod(id);
  if (!period) return apiError(404, `no period with id ${id}`, { field: "id" });
  let report;
  try {
    ({ report } = await loadPeriodReport(period, { preview: format === "json", maxRows: rows === "none" ? 0 : undefined }));
  } catch (err) {
    return knownError(err);
  }
  const filename = exportFileName(period.name, period.id, "exposure", format);
  const disposition = `attachment; filename="${filename}"`;
  if (format === "csv") {
    return new NextResponse(exposureCsv(report), {
      headers: { "content-type": "text/csv; charset=utf-8; header=present", "content-disposition": disposition },
    });
  }
  return NextResponse.json(report, { headers: { "content-disposition": disposition } });
}
