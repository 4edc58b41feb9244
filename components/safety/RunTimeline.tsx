import { formatHoursMinutes } from "./age";

export type TimelineRun = { number: number; type: string; startMs: number; endMs: number | null };

/** A small strip for one injection: the decay wait as a band, runs as blocks; science runs inside the wait are marked. */
export function RunTimeline({ injectedMs, waitEndMs, runs, nowMs }: { injectedMs: number; waitEndMs: number; runs: TimelineRun[]; nowMs: number }) {
  const pad = (waitEndMs - injectedMs) * 0.15;
  const from = injectedMs - pad;
  const to = waitEndMs + pad;
  const pct = (t: number) => `${(((Math.min(Math.max(t, from), to) - from) / (to - from)) * 100).toFixed(2)}%`;
  const width = (a: number, b: number) => `${(((Math.min(b, to) - Math.max(a, from)) / (to - from)) * 100).toFixed(2)}%`;
  const inside = (r: TimelineRun) => r.type === "science" && r.startMs < waitEndMs && (r.endMs ?? nowMs) > injectedMs;
  const iso = (t: number) => new Date(t).toISOString().slice(0, 16).replace("T", " ");
  return (
    <figure className="my-2" aria-label={`Run timeline around the injection at ${iso(injectedMs)} UTC`}>
      <div className="relative h-12 overflow-hidden rounded border border-line bg-raised">
        <div className="absolute inset-y-0 border-x-2 border-warn bg-warn/15" style={{ left: pct(injectedMs), width: width(injectedMs, waitEndMs) }} title={`decay wait ${iso(injectedMs)} – ${iso(waitEndMs)} UTC`} />
        {runs.filter((r) => r.startMs < to && (r.endMs ?? nowMs) > from).map((r) => (
          <div
            key={r.number}
            className={`absolute top-6 h-5 overflow-hidden rounded-sm border px-0.5 text-[10px] leading-4 ${inside(r) ? "border-bad bg-bad/25" : r.type === "calibration" ? "border-info bg-info/20" : "border-line bg-panel"}`}
            style={{ left: pct(r.startMs), width: width(r.startMs, r.endMs ?? nowMs) }}
            title={`run ${r.number} (${r.type})${inside(r) ? ": inside decay wait" : ""}`}
          >
            {r.number}
          </div>
        ))}
        <span className="absolute left-1 top-0.5 text-[10px] text-muted">▼ injection {iso(injectedMs)}</span>
        <span className="absolute right-1 top-0.5 text-[10px] text-muted">wait ends {iso(waitEndMs)} ▼</span>
      </div>
      <figcaption className="mt-1 text-xs text-muted">
        Band: decay wait ({formatHoursMinutes((waitEndMs - injectedMs) / 1000)}). Blocks: runs; <span className="text-bad">⚠ marked</span> science runs fall inside the wait.
      </figcaption>
    </figure>
  );
}
