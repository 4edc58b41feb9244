"use client";
/**
 * μ_up against the assumed background for fixed n, method and CL, with the recorded b marked. The curve
 * (one limit per grid point; Feldman–Cousins takes a few milliseconds each) is computed on a deferred render,
 * so the table updates first and the chart follows, with a visible "updating" note meanwhile.
 */
import { useDeferredValue, useMemo } from "react";
import type uPlot from "uplot";
import { UPlotChart } from "@/components/charts/UPlotChart";
import { LimitInputError, type LimitMethod } from "@/lib/limits";
import { events, limitTag, upperCurveData, type CurveData } from "@/lib/limits-view";

/** A theme colour (CSS variable holding "r g b") as rgb(), read on the client; fallback on the server. */
function themeColour(name: string, fallback: string): string {
  if (typeof document === "undefined") return fallback;
  const v = getComputedStyle(document.documentElement).getPropertyValue(`--${name}`).trim();
  return v ? `rgb(${v.replace(/ +/g, ",")})` : fallback;
}

type ChartInput = { method: LimitMethod; cl: number; observed: number; background: number | null };

function curveOf(i: ChartInput): { data: CurveData } | { problem: string } {
  try {
    return { data: upperCurveData(i.method, i.observed, i.cl, i.background) };
  } catch (err) {
    if (err instanceof LimitInputError) return { problem: `${err.field} ${err.reason}` };
    throw err;
  }
}

/** The chart for one period or the combination; `title` names it in the caption and the accessible label. */
export function LimitChart({ title, method, cl, observed, background }: ChartInput & { title: string }) {
  const input = useMemo(() => ({ method, cl, observed, background }), [method, cl, observed, background]);
  const shown = useDeferredValue(input);
  const stale = shown !== input;
  const curve = useMemo(() => curveOf(shown), [shown]);
  const tag = limitTag(shown.method, shown.cl);
  const data = useMemo<uPlot.AlignedData | null>(
    () => ("data" in curve ? [curve.data.backgrounds, curve.data.upper, curve.data.marker] : null),
    [curve],
  );
  const options = useMemo<Omit<uPlot.Options, "width" | "height">>(() => {
    const warn = themeColour("warn", "rgb(232,178,80)");
    return {
      scales: { x: { time: false }, y: { range: (_u, _min, max) => [0, Math.max(1, max * 1.08)] } },
      series: [
        { label: "assumed b (events)", value: (_u, v) => (v == null ? "—" : `${v.toFixed(3)} events`) },
        { label: `μ_up · ${tag}`, stroke: themeColour("accent", "rgb(122,178,255)"), width: 2, points: { show: false }, value: (_u, v) => (v == null ? "—" : `${v.toFixed(3)} events`) },
        {
          label: "recorded b",
          stroke: warn,
          width: 0,
          paths: () => null,
          points: { show: true, size: 11, fill: warn, stroke: warn },
          value: (_u, v) => (v == null ? "—" : `${v.toFixed(3)} events`),
        },
      ],
      axes: [{ label: "assumed background b (events)" }, { label: "μ_up (events)", size: 60 }],
    };
  }, [tag]);
  const atRecorded = "data" in curve && shown.background !== null ? curve.data.marker.find((v) => v !== null) : undefined;
  return (
    <figure className="space-y-2" aria-busy={stale}>
      {"problem" in curve ? (
        <p role="alert" className="text-sm text-warn"><span aria-hidden>⚠ </span>No curve: {curve.problem}</p>
      ) : (
        data && <UPlotChart options={options} data={data} label={`Upper limit μ_up against assumed background for ${title}, n = ${shown.observed}, ${tag}`} height={260} />
      )}
      <figcaption className="text-xs text-muted">
        {title}: n = {shown.observed} observed; b from 0 to {events(Math.max(2 * (shown.background ?? 0), 5))} events · {tag}.{" "}
        {shown.background === null
          ? "No background recorded, so no marker."
          : atRecorded !== undefined && atRecorded !== null
            ? `At the recorded b = ${shown.background} events: μ_up = ${events(atRecorded)} events · ${tag}.`
            : `At the recorded b = ${shown.background} events there is no ${tag} upper limit.`}
        {shown.method === "classical" && " Gaps in the curve are backgrounds where the classical construction gives no limit."}
        {stale && <span role="status" className="ml-2 text-info"><span aria-hidden>⟳ </span>Updating the curve…</span>}
      </figcaption>
    </figure>
  );
}
