import Link from "next/link";
import { notFound } from "next/navigation";
import { getPeriod } from "@/db/periods";
import { loadPeriodReport } from "@/db/exposure";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { ExposureInputError } from "@/lib/exposure";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { BlindBadge } from "@/components/exposure/BlindBadge";
import { CumulativeChart, DailyLiveChart } from "@/components/exposure/ExposureCharts";
import { RunArithmeticTable } from "@/components/exposure/RunArithmeticTable";
import { TotalsPanel } from "@/components/exposure/TotalsPanel";
import { fixed, kgDay, signed, utcText } from "@/components/exposure/format";
import type { ProposedPreview } from "@/components/exposure/report";

export const metadata = { title: "Period exposure" };
export const dynamic = "force-dynamic";

/** Rows of the per-run table on the page; the exports hold every run. */
const RUN_ROWS_SHOWN = 1000;

function PreviewLine({ preview }: { preview: ProposedPreview | null }) {
  if (!preview || preview.proposedExcludingFlags === 0) {
    return <p className="text-sm text-muted" data-testid="preview">No proposed excluding flags await confirmation in this period.</p>;
  }
  const n = preview.proposedExcludingFlags;
  return (
    <p className="rounded border border-warn/50 bg-warn/10 px-3 py-2 text-sm" data-testid="preview" data-value={preview.exposureKgDay} data-change={preview.changeKgDay}>
      <span aria-hidden>◌ </span>If the {n} proposed excluding flag{n === 1 ? "" : "s"} {n === 1 ? "was" : "were"} confirmed: exposure {kgDay(preview.exposureKgDay)} (
      {signed(preview.changeKgDay, 3)} kg·day). <Link href="/quality?state=proposed" className="text-accent hover:underline">Review them</Link>
    </p>
  );
}

export default async function PeriodExposurePage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireRole("periods.read");
  const id = Number((await params).id);
  const period = Number.isInteger(id) && id > 0 ? await getPeriod(id) : null;
  if (!period) notFound();
  let computed: Awaited<ReturnType<typeof loadPeriodReport>> | null = null;
  let problem: string | null = null;
  try {
    computed = await loadPeriodReport(period, { preview: true, series: true, maxRows: RUN_ROWS_SHOWN });
  } catch (err) {
    if (!(err instanceof ExposureInputError)) throw err;
    problem = err.message;
  }
  const base = `/api/periods/${period.id}`;
  return (
    <section className="space-y-5">
      <p className="text-sm"><Link href="/exposure" className="text-accent hover:underline">← Exposure</Link></p>
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="flex flex-wrap items-center gap-2 text-xl font-semibold">{period.name} <BlindBadge blind={period.blind} /></h1>
          <p className="text-sm text-muted tabular">
            <Time at={period.startAt} withSeconds /> → <Time at={period.endAt} withSeconds /> UTC · run types: {period.runTypes.join(", ")} · detector: {period.detector ?? "every detector"} · signal acceptance {fixed(period.signalAcceptance, 3)}
          </p>
          {period.notes && <p className="mt-1 max-w-3xl text-sm">{period.notes}</p>}
        </div>
        <div className="flex flex-wrap gap-2 text-sm">
          {rolesAllow(user.roles, "periods.manage") && <Link href={`/exposure/${period.id}/edit`} className="rounded border border-line px-3 py-1">Edit period</Link>}
          <a href={`${base}/exposure?format=csv`} className="rounded border border-line px-3 py-1" download>⤓ Exposure CSV</a>
          <a href={`${base}/exposure?format=json`} className="rounded border border-line px-3 py-1" download>⤓ Exposure JSON</a>
          <a href={`${base}/good-runs?format=csv`} className="rounded border border-line px-3 py-1" download>⤓ Good-run list CSV</a>
          <a href={`${base}/good-runs?format=json`} className="rounded border border-line px-3 py-1" download>⤓ Good-run list JSON</a>
        </div>
      </div>

      {problem && <p role="alert" className="rounded border border-bad/60 bg-bad/10 p-3 text-sm">⚠ Exposure cannot be computed until this is fixed: {problem}</p>}
      {computed && (
        <>
          {computed.detectorsCounted.length > 1 && (
            <p role="alert" className="rounded border border-warn/60 bg-warn/10 px-3 py-2 text-sm" data-testid="mixed-detectors">
              <span aria-hidden>⚠ </span>This period counts runs of {computed.detectorsCounted.join(" and ")}: their target masses add up in one
              exposure. Name one detector in the period unless that is what the analysis intends.
            </p>
          )}
          <TotalsPanel totals={computed.report.totals} />
          <PreviewLine preview={computed.report.preview} />
          {computed.series && (
            <div className="grid gap-4 lg:grid-cols-2">
              <figure className="rounded-lg border border-line bg-panel p-3">
                <figcaption className="mb-1 text-sm font-medium">Cumulative exposure (kg·day) against time (UTC)</figcaption>
                <CumulativeChart series={computed.series} label={`Cumulative exposure of ${period.name}`} />
              </figure>
              <figure className="rounded-lg border border-line bg-panel p-3">
                <figcaption className="mb-1 text-sm font-medium">Daily good live fraction (good live s / 86 400 per UTC day)</figcaption>
                <DailyLiveChart series={computed.series} label={`Daily live fraction of ${period.name}`} />
              </figure>
            </div>
          )}
          <section aria-labelledby="runs-heading">
            <h2 id="runs-heading" className="mb-2 font-medium">Runs counted ({computed.report.totals.runs})</h2>
            {computed.report.runs.length === 0 ? (
              <EmptyState title="No ended runs of these types in this span.">Runs appear here once the DAQ closes them with a live time.</EmptyState>
            ) : (
              <RunArithmeticTable rows={computed.report.runs} omitted={computed.report.runsOmitted} detectorOf={computed.detectorOf} />
            )}
          </section>
          <section aria-labelledby="open-heading">
            <h2 id="open-heading" className="mb-2 font-medium">Listed apart, not counted ({computed.report.openRuns.length})</h2>
            {computed.report.openRuns.length === 0 ? (
              <p className="text-sm text-muted">No open runs overlap this period.</p>
            ) : (
              <ul className="text-sm tabular" aria-label="Runs not counted">
                {computed.report.openRuns.map((o) => (
                  <li key={o.runNumber}>
                    run {o.runNumber} · {o.runType} · started {utcText(o.runStart)} UTC · {o.state === "running" ? "◷ still running" : "⚠ closed without a live time"}
                  </li>
                ))}
              </ul>
            )}
          </section>
        </>
      )}
    </section>
  );
}
