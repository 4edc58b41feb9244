"use client";
import { useEffect, useRef } from "react";
import type uPlot from "uplot";
import "uplot/dist/uPlot.min.css";

/**
 * A uPlot chart. uPlot touches the DOM, so it is loaded in an effect on the client only.
 * `options` without width (the chart follows its container's width); `data` as uPlot's aligned arrays.
 */
export function UPlotChart({ options, data, height = 260, label }: { options: Omit<uPlot.Options, "width" | "height">; data: uPlot.AlignedData; height?: number; label: string }) {
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    let chart: uPlot | undefined;
    let observer: ResizeObserver | undefined;
    let cancelled = false;
    void import("uplot").then(({ default: UPlot }) => {
      if (cancelled || !box.current) return;
      const el = box.current;
      const css = getComputedStyle(document.documentElement);
      const ink = `rgb(${css.getPropertyValue("--muted").trim().replace(/ /g, ",")})`;
      const grid = `rgba(${css.getPropertyValue("--line").trim().replace(/ /g, ",")},0.6)`;
      const axes = (options.axes ?? [{}, {}]).map((a) => ({ stroke: ink, grid: { stroke: grid, width: 1 }, ticks: { stroke: grid, width: 1 }, ...a }));
      chart = new UPlot({ ...options, axes, width: el.clientWidth || 600, height }, data, el);
      observer = new ResizeObserver(() => chart?.setSize({ width: el.clientWidth, height }));
      observer.observe(el);
    });
    return () => {
      cancelled = true;
      observer?.disconnect();
      chart?.destroy();
    };
  }, [options, data, height]);
  return <div ref={box} role="img" aria-label={label} className="w-full" />;
}
