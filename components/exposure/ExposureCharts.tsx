"use client";
/**
 * The charts of the exposure pages: cumulative exposure against time, daily live fraction, and two periods'
 * cumulative exposure against days since their start. Thin wrappers building uPlot options around UPlotChart.
 */
import { useMemo } from "react";
import type uPlot from "uplot";
import { UPlotChart } from "@/components/charts/UPlotChart";
import type { ExposureSeries } from "./compute";

/** A theme colour (CSS variable holding "r g b") as rgb(), read on the client; fallback on the server. */
function themeColour(name: string, fallback: string): string {
  if (typeof document === "undefined") return fallback;
  const v = getComputedStyle(document.documentElement).getPropertyValue(`--${name}`).trim();
  return v ? `rgb(${v.replace(/ +/g, ",")})` : fallback;
}

/** Cumulative exposure (kg·day) against UTC time. */
export function CumulativeChart({ series, label }: { series: ExposureSeries; label: string }) {
  const data = useMemo<uPlot.AlignedData>(() => [series.cumulative.t, series.cumulative.kgDay], [series]);
  const options = useMemo<Omit<uPlot.Options, "width" | "height">>(
    () => ({
      scales: { x: { time: true } },
      series: [{ label: "UTC" }, { label: "exposure (kg·day)", stroke: themeColour("accent", "rgb(122,178,255)"), width: 2, value: (_u, v) => (v == null ? "—" : `${v.toFixed(3)} kg·day`) }],
      axes: [{}, { label: "kg·day", size: 70 }],
      tzDate: (ts: number) => new Date(ts * 1000 + new Date(ts * 1000).getTimezoneOffset() * 60_000),
    }),
    [],
  );
  if (series.cumulative.t.length === 0) return <p className="text-sm text-muted">No counted runs yet, so no exposure to draw.</p>;
  return <UPlotChart options={options} data={data} label={label} height={240} />;
}

/** Fraction of each UTC day that was good live time (0–1). */
export function DailyLiveChart({ series, label }: { series: ExposureSeries; label: string }) {
  const data = useMemo<uPlot.AlignedData>(() => [series.daily.t, series.daily.liveFraction], [series]);
  const options = useMemo<Omit<uPlot.Options, "width" | "height">>(
    () => ({
      scales: { x: { time: true }, y: { range: [0, 1] } },
      series: [
        { label: "UTC day" },
        { label: "good live fraction", stroke: themeColour("good", "rgb(77,196,170)"), width: 1.5, points: { show: true, size: 5 }, value: (_u, v) => (v == null ? "—" : `${(v * 100).toFixed(1)} %`) },
      ],
      axes: [{}, { label: "fraction of day", size: 60 }],
      tzDate: (ts: number) => new Date(ts * 1000 + new Date(ts * 1000).getTimezoneOffset() * 60_000),
    }),
    [],
  );
  if (series.daily.t.length === 0) return <p className="text-sm text-muted">The period has no days to draw.</p>;
  return <UPlotChart options={options} data={data} label={label} height={200} />;
}

/** Two periods' cumulative exposure against days since each period's start. */
export function CompareChart({ aligned, names, label }: { aligned: [number[], (number | null)[], (number | null)[]]; names: [string, string]; label: string }) {
  const data = useMemo<uPlot.AlignedData>(() => aligned, [aligned]);
  const options = useMemo<Omit<uPlot.Options, "width" | "height">>(
    () => ({
      scales: { x: { time: false } },
      series: [
        { label: "days since start", value: (_u, v) => (v == null ? "—" : v.toFixed(2)) },
        { label: names[0], stroke: themeColour("accent", "rgb(122,178,255)"), width: 2 },
        { label: names[1], stroke: themeColour("warn", "rgb(232,178,80)"), width: 2, dash: [6, 4] },
      ],
      axes: [{ label: "days since period start" }, { label: "kg·day", size: 70 }],
    }),
    [names],
  );
  return <UPlotChart options={options} data={data} label={label} height={260} />;
}
