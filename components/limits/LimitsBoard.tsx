"use client";
/**
 * The limits page's working area: method and CL selectors, the per-period table with the combined row, the
 * μ_up-versus-background chart and (for conveners) the recording form. Every number is computed here in the
 * browser by lib/limits-view over lib/limits, the same code the API answers with, so a change of method or
 * CL shows at once.
 */
import { useMemo, useState } from "react";
import type { LimitMethod } from "@/lib/limits";
import {
  acceptanceText,
  combinePeriods,
  combinedLimitView,
  kgDayText,
  limitTag,
  periodLimitView,
  type LimitView,
} from "@/lib/limits-view";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import { BlindCell, LimitCells } from "./LimitCells";
import { LimitChart } from "./LimitChart";
import { LimitSettings } from "./LimitSettings";
import { RecordForm, type RecordAction } from "./RecordForm";
import { combinable, type LimitRow } from "./rows";

const COMBINED = "combined";

function Analysis({ row }: { row: LimitRow }) {
  if (row.blind) return <Badge tone="accent" icon="◐" title="Count and limit hidden until the unblinding is recorded">blind</Badge>;
  if (row.unblindedAt) return <Badge tone="good" icon="◑" title={`Unblinded ${row.unblindedAt.slice(0, 16).replace("T", " ")} UTC`}>unblinded</Badge>;
  return <Badge tone="muted" icon="○" title="Not a blind analysis">not blind</Badge>;
}

function BackgroundCell({ row }: { row: LimitRow }) {
  if (row.background === null) return <td className="px-2 py-1.5 text-muted">— not recorded</td>;
  return (
    <td className="px-2 py-1.5">
      <span className="whitespace-nowrap" data-testid="background">{row.background} events</span>
      {row.backgroundNote && <span className="block max-w-[14rem] truncate text-xs text-muted" title={row.backgroundNote}>{row.backgroundNote}</span>}
    </td>
  );
}

function awaitingText(view: LimitView, canRecord: boolean): string {
  const missing = view.state === "awaiting" ? view.missing : [];
  const what = missing.includes("observed") ? (missing.includes("background") ? "No count or background recorded yet" : "No count recorded yet") : "No background recorded yet";
  return canRecord ? `${what}; record it below.` : `${what}.`;
}

/** The board for the given rows; initial method and CL come from the page address. */
export function LimitsBoard({ rows, initialMethod, initialCl, canRecord, recordAction }: { rows: LimitRow[]; initialMethod: LimitMethod; initialCl: number; canRecord: boolean; recordAction: RecordAction }) {
  const [method, setMethod] = useState<LimitMethod>(initialMethod);
  const [cl, setCl] = useState(initialCl);
  const [recordId, setRecordId] = useState<number>(rows[0]?.id ?? 0);
  const [chartChoice, setChartChoice] = useState<string>(COMBINED);

  const views = useMemo(() => rows.map((r) => ({ row: r, view: periodLimitView(combinable(r), method, cl) })), [rows, method, cl]);
  const combo = useMemo(() => combinePeriods(rows.map(combinable)), [rows]);
  const combined = useMemo(() => combinedLimitView(combo, method, cl), [combo, method, cl]);

  function remember(m: LimitMethod, c: number) {
    // Keeps the choice in the address so a link reproduces the same numbers.
    window.history.replaceState(null, "", `?method=${m}&cl=${c}`);
  }

  const chartable = rows.filter((r) => !r.blind && r.observed !== null);
  // The chosen chart, or the first one still available (combined first) when the choice has gone away.
  const keys = [...(combo.included.length > 0 ? [COMBINED] : []), ...chartable.map((r) => String(r.id))];
  const chartKey = keys.includes(chartChoice) ? chartChoice : keys[0];
  const chartRow = chartable.find((r) => String(r.id) === chartKey);
  const chartTarget =
    chartKey === COMBINED
      ? { title: `Combined (${combo.included.map((p) => p.name).join(", ")})`, observed: combo.observed, background: combo.background }
      : chartRow
        ? { title: chartRow.name, observed: chartRow.observed!, background: chartRow.background }
        : null;

  return (
    <div className="space-y-4">
      <LimitSettings
        method={method}
        cl={cl}
        onMethod={(m) => {
          setMethod(m);
          remember(m, cl);
        }}
        onCl={(c) => {
          setCl(c);
          remember(method, c);
        }}
      />
      <div className="overflow-x-auto">
        <table className="w-full text-sm" aria-label="Limits per period">
          <thead className="text-left text-xs text-muted">
            <tr>
              <th className="py-1.5 pr-2">Period</th>
              <th className="px-2">Analysis</th>
              <th className="px-2 text-right">Acceptance</th>
              <th className="px-2 text-right">Exposure</th>
              <th className="px-2">Expected b</th>
              <th className="px-2 text-right">Observed n</th>
              <th className="px-2">μ interval</th>
              <th className="px-2">Rate limit</th>
            </tr>
          </thead>
          <tbody className="tabular">
            {views.map(({ row, view }) => (
              <tr key={row.id} className="border-t border-line align-top" data-testid={`limit-row-${row.id}`}>
                <td className="py-1.5 pr-2">
                  <span className="font-medium whitespace-nowrap">{row.name}</span>
                  <span className="block text-xs text-muted">quoted as {limitTag(row.quotedMethod, row.quotedCl)}</span>
                  {canRecord && (
                    <button
                      type="button"
                      className="text-xs text-accent hover:underline"
                      onClick={() => {
                        setRecordId(row.id);
                        document.getElementById("record-form")?.scrollIntoView({ behavior: "smooth", block: "center" });
                      }}
                    >
                      Record for this period
                    </button>
                  )}
                </td>
                <td className="px-2 py-1.5"><Analysis row={row} /></td>
                <td className="px-2 py-1.5 text-right">{acceptanceText(row.acceptance)}</td>
                <td className="px-2 py-1.5 text-right whitespace-nowrap" data-testid="exposure" data-value={row.exposureKgDay ?? undefined}>
                  {row.exposureKgDay === null ? "— cannot compute" : kgDayText(row.exposureKgDay)}
                </td>
                <BackgroundCell row={row} />
                {view.state === "blind" ? (
                  <BlindCell span={3} />
                ) : (
                  <>
                    <td className="px-2 py-1.5 text-right" data-testid="observed">{row.observed === null ? "—" : `${row.observed} events`}</td>
                    <LimitCells view={view} method={method} cl={cl} awaitingText={awaitingText(view, canRecord)} />
                  </>
                )}
              </tr>
            ))}
          </tbody>
          <tfoot className="tabular">
            <tr className="border-t-2 border-line align-top" data-testid="limit-row-combined">
              <td className="py-1.5 pr-2" colSpan={3}>
                <span className="font-medium">Combined</span>
                <span className="block text-xs text-muted">
                  {combo.included.length === 0 ? "no period can take part yet" : combo.included.map((p) => p.name).join(" + ")}
                </span>
              </td>
              <td className="px-2 py-1.5 text-right whitespace-nowrap" data-testid="exposure" data-value={combo.acceptanceExposureKgDay}>
                {combo.included.length === 0 ? "—" : (
                  <>
                    <span className="block text-xs text-muted">Σ acceptance × exposure</span>
                    {kgDayText(combo.acceptanceExposureKgDay)}
                  </>
                )}
              </td>
              <td className="px-2 py-1.5" data-testid="background">{combo.included.length === 0 ? "—" : `Σ b = ${combo.background} events`}</td>
              <td className="px-2 py-1.5 text-right" data-testid="observed">{combo.included.length === 0 ? "—" : `Σ n = ${combo.observed} events`}</td>
              <LimitCells view={combined} method={method} cl={cl} awaitingText="Nothing to combine: no period is unblinded with n, b and exposure known." />
            </tr>
          </tfoot>
        </table>
      </div>
      {combo.leftOut.length > 0 && (
        <p className="text-xs text-muted" data-testid="left-out">
          Left out of the combination: {combo.leftOut.map((p) => `${p.name} (${p.why})`).join(", ")}.
        </p>
      )}

      <section className="space-y-2 rounded-lg border border-line bg-panel p-4" aria-label="Upper limit against background">
        <div className="flex flex-wrap items-end justify-between gap-2">
          <h2 className="text-base font-semibold">Upper limit against the assumed background</h2>
          {chartTarget && (
            <label className="text-xs text-muted">
              Chart for
              <select value={chartKey} onChange={(e) => setChartChoice(e.target.value)} className="mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm text-ink">
                {combo.included.length > 0 && <option value={COMBINED}>Combined</option>}
                {chartable.map((r) => <option key={r.id} value={String(r.id)}>{r.name}</option>)}
              </select>
            </label>
          )}
        </div>
        {chartTarget ? (
          <LimitChart title={chartTarget.title} method={method} cl={cl} observed={chartTarget.observed} background={chartTarget.background} />
        ) : (
          <EmptyState title="Nothing to draw yet.">
            The chart needs a period that is not blind and has its observed count recorded{canRecord ? "; record one below." : "."}
          </EmptyState>
        )}
      </section>

      {canRecord && rows.length > 0 && <RecordForm rows={rows} selectedId={recordId} onSelect={setRecordId} action={recordAction} />}
    </div>
  );
}
