"use client";
import { useMemo } from "react";
import type uPlot from "uplot";
import { UPlotChart } from "@/components/charts/UPlotChart";
import { formatBq } from "@/lib/safety/activity-units";

function isDecade(v: number): boolean {
  if (!(v > 0)) return false;
  const l = Math.log10(v);
  return Math.abs(l - Math.round(l)) < 1e-9;
}

/**
 * Activity against time. `x` is either UTC seconds (a sealed source over the years) or hours after an injection
 * (a gaseous source over its decay wait, on a log scale with the wait threshold drawn).
 */
export function ActivityChart({ x, y, xKind, thresholdBq, label }: { x: number[]; y: number[]; xKind: "utc" | "hours"; thresholdBq?: number; label: string }) {
  const data = useMemo<uPlot.AlignedData>(
    () => (thresholdBq === undefined ? [x, y] : [x, y, x.map(() => thresholdBq)]),
    [x, y, thresholdBq],
  );
  const options = useMemo<Omit<uPlot.Options, "width" | "height">>(() => {
    const bq = (v: number) => (Number.isFinite(v) && v >= 1e-3 ? formatBq(v, 2) : v > 0 ? "< 1 mBq" : "0");
    const series: uPlot.Series[] = [
      xKind === "utc" ? { label: "date (UTC)" } : { label: "hours after injection", value: (_u, v) => (v == null ? "—" : `${v.toFixed(1)} h`) },
      { label: "activity", stroke: "rgb(122,178,255)", width: 2, value: (_u, v) => (v == null ? "—" : bq(v)) },
    ];
    if (thresholdBq !== undefined) series.push({ label: "decay-wait threshold", stroke: "rgb(232,178,80)", width: 1, dash: [6, 4], value: (_u, v) => (v == null ? "—" : bq(v)) });
    return {
      scales: { x: { time: xKind === "utc" }, y: xKind === "hours" ? { distr: 3 } : { range: (_u, _min, max) => [0, max * 1.05] } },
      series,
      axes: [
        xKind === "utc" ? {} : { label: "hours after injection", values: (_u, vals) => vals.map((v) => `${v} h`) },
        // On the log scale uPlot ticks 1…9 × each decade; label only the decades so the labels do not overlap.
        { label: "activity", size: 80, values: (_u, vals) => vals.map((v) => (xKind === "hours" && !isDecade(v) ? "" : bq(v))) },
      ],
      legend: { show: true },
    };
  }, [xKind, thresholdBq]);
  return <UPlotChart options={options} data={data} label={label} height={240} />;
}
