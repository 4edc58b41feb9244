/** A period's totals: runs, live time, good live time, lost, and exposure in kg·day and t·yr, with the formula. */
import type { PeriodTotals } from "@/lib/exposure";
import { days, fixed, hours, kgDay, tonneYear } from "./format";
import { EXPOSURE_FORMULA } from "./report";

function Figure({ label, testId, value, children }: { label: string; testId?: string; value?: number; children: React.ReactNode }) {
  return (
    <div className="rounded border border-line bg-raised/40 px-3 py-2">
      <dt className="text-xs text-muted">{label}</dt>
      <dd className="tabular" data-testid={testId} data-value={value}>{children}</dd>
    </div>
  );
}

/** The totals block; `prefix` keeps test ids unique when two panels share a page. */
export function TotalsPanel({ totals, prefix = "total" }: { totals: PeriodTotals; prefix?: string }) {
  return (
    <section aria-label="Totals">
      <dl className="grid gap-2 sm:grid-cols-3 lg:grid-cols-6">
        <Figure label="Runs counted" testId={`${prefix}-runs`} value={totals.runs}>{totals.runs}{totals.openRuns > 0 && <span className="text-xs text-muted"> (+{totals.openRuns} open, not counted)</span>}</Figure>
        <Figure label="Live time in period" testId={`${prefix}-live`} value={totals.liveSeconds}>{days(totals.liveSeconds)}<div className="text-xs text-muted">{hours(totals.liveSeconds, 2)}</div></Figure>
        <Figure label="Good live time" testId={`${prefix}-good-live`} value={totals.goodLiveSeconds}>{days(totals.goodLiveSeconds)}<div className="text-xs text-muted">{hours(totals.goodLiveSeconds, 2)}</div></Figure>
        <Figure label="Lost to excluding flags" testId={`${prefix}-lost`} value={totals.lostLiveSeconds}>{hours(totals.lostLiveSeconds, 3)}<div className="text-xs text-muted">{fixed(totals.liveSeconds > 0 ? (100 * totals.lostLiveSeconds) / totals.liveSeconds : 0, 2)} % of live</div></Figure>
        <Figure label="Exposure" testId={`${prefix}-exposure-kgday`} value={totals.exposureKgDay}><span className="font-semibold">{kgDay(totals.exposureKgDay)}</span></Figure>
        <Figure label="Exposure" testId={`${prefix}-exposure-tyr`} value={totals.exposureTonneYear}>{tonneYear(totals.exposureTonneYear)}</Figure>
      </dl>
      <p className="mt-1 text-xs text-muted">
        Exposure = {EXPOSURE_FORMULA} (per run, summed), in kg·day; 1 t·yr = 365 250 kg·day (Julian year). Good live = DAQ live × (run time outside confirmed excluding flags) / run duration.
      </p>
    </section>
  );
}
