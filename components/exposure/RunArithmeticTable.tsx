/**
 * The per-run table of a period's exposure with every step of the arithmetic written out, so a reader can redo
 * any row by hand: live × good / duration = good live, then good live × mass / 86 400 = kg·day.
 */
import { Badge } from "@/components/ui/Badge";
import { fixed, hours, kgDay, utcText } from "./format";
import type { ExposureReportRow } from "./report";

function cautionSeconds(row: ExposureReportRow): number {
  return row.cautionIntervals.reduce((s, i) => s + (Date.parse(i.end) - Date.parse(i.start)) / 1000, 0);
}

/** Counted runs of a period; `omitted` more were left out of the page (the exports hold all). */
export function RunArithmeticTable({ rows, omitted = 0, detectorOf }: { rows: ExposureReportRow[]; omitted?: number; detectorOf: ReadonlyMap<number, string> }) {
  const shown = rows;
  return (
    <div className="overflow-x-auto">
      {omitted > 0 && (
        <p className="mb-2 text-sm text-muted">Showing the first {rows.length} of {rows.length + omitted} runs; the CSV and JSON exports hold every run.</p>
      )}
      <table className="w-full text-xs" aria-label="Exposure per run">
        <thead className="text-left text-muted">
          <tr>
            <th className="py-1.5 pr-2">Run</th>
            <th className="pr-2">Window in period (UTC)</th>
            <th className="pr-2 text-right">Good time / duration</th>
            <th className="pr-2">DAQ live × good / duration = good live</th>
            <th className="pr-2">good live / 86 400 × mass = exposure</th>
            <th className="pr-2 text-right">Lost live</th>
            <th>Flags</th>
          </tr>
        </thead>
        <tbody className="font-mono tabular">
          {shown.map((r) => {
            const caution = cautionSeconds(r);
            const excluded = r.windowSeconds - r.goodSeconds;
            return (
              <tr key={r.runNumber} className="border-t border-line align-top" data-testid={`exposure-run-${r.runNumber}`}>
                <td className="py-1 pr-2">
                  {r.runNumber}
                  <div className="font-sans text-muted">{r.runType}{detectorOf.get(r.runNumber) ? ` · ${detectorOf.get(r.runNumber)}` : ""}</div>
                </td>
                <td className="pr-2">{utcText(r.windowStart)}<br />{utcText(r.windowEnd)}</td>
                <td className="pr-2 text-right">{fixed(r.goodSeconds, 0)} s<br /><span className="text-muted">/ {fixed(r.runDurationSeconds, 0)} s</span></td>
                <td className="pr-2">
                  {fixed(r.daqLiveSeconds, 1)} s × {fixed(r.goodSeconds, 0)} / {fixed(r.runDurationSeconds, 0)}
                  <br />= <span className="text-ink">{fixed(r.goodLiveSeconds, 1)} s</span>
                </td>
                <td className="pr-2">
                  {fixed(r.goodLiveSeconds, 1)} / 86 400 × {fixed(r.targetMassKg, 4)} kg
                  <br />= <span className="font-semibold text-ink" data-value={r.exposureKgDay}>{kgDay(r.exposureKgDay)}</span>
                </td>
                <td className="pr-2 text-right">{fixed(r.lostLiveSeconds, 1)} s</td>
                <td className="font-sans">
                  <div className="flex flex-wrap gap-1">
                    {excluded > 0 && <Badge tone="bad" icon="✕" title="Time removed by confirmed excluding flags">{hours(excluded, 2)} excluded</Badge>}
                    {caution > 0 && <Badge tone="info" icon="!" title="Time under confirmed caution flags (not removed)">{hours(caution, 2)} caution</Badge>}
                    {excluded === 0 && caution === 0 && <Badge tone="good" icon="✓">clean</Badge>}
                  </div>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
