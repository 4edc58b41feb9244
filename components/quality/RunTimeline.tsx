"use client";
/**
 * A run drawn as a horizontal bar with its flags on it. Drag across the bar to pick a flag's start and end,
 * or click once for the start and again for the end; the picked span is handed to `onPick` (whole seconds).
 * Typed fields stay the keyboard way in; this bar is a faster way to fill them.
 */
import { useRef, useState } from "react";
import type { FlagState, FlagVerdict } from "@/db/schema/quality";

export type TimelineFlag = { id: number; startMs: number; endMs: number; verdict: FlagVerdict; state: FlagState; subsystemLabel: string };

type Props = {
  run: { number: number; startMs: number; endMs: number; open: boolean };
  flags: TimelineFlag[];
  selection: { startMs: number | null; endMs: number | null };
  onPick: (startMs: number, endMs: number | null) => void;
};

const hhmmss = (ms: number) => new Date(ms).toISOString().slice(11, 19);
const stamp = (ms: number) => new Date(ms).toISOString().slice(0, 19).replace("T", " ");

function pct(ms: number, run: Props["run"]): number {
  return Math.min(100, Math.max(0, ((ms - run.startMs) / (run.endMs - run.startMs)) * 100));
}

function flagStyle(f: TimelineFlag): string {
  const fill = f.verdict === "exclude" ? "bg-bad/45" : "bg-info/35";
  const edge = f.state === "proposed" ? "border-2 border-dashed border-warn" : "border border-ink/30";
  return `${fill} ${edge}`;
}

/** The run's bar with its flags and the picked span. */
export function RunTimeline({ run, flags, selection, onPick }: Props) {
  const bar = useRef<HTMLDivElement>(null);
  const drag = useRef<{ anchorMs: number; x: number; moved: boolean } | null>(null);
  const [awaitingEnd, setAwaitingEnd] = useState(false);

  const msAt = (clientX: number): number => {
    const rect = bar.current!.getBoundingClientRect();
    const frac = Math.min(1, Math.max(0, (clientX - rect.left) / rect.width));
    return Math.round((run.startMs + frac * (run.endMs - run.startMs)) / 1000) * 1000;
  };

  const onPointerDown = (e: React.PointerEvent<HTMLDivElement>) => {
    e.currentTarget.setPointerCapture(e.pointerId);
    drag.current = { anchorMs: msAt(e.clientX), x: e.clientX, moved: false };
  };
  const onPointerMove = (e: React.PointerEvent<HTMLDivElement>) => {
    const d = drag.current;
    if (!d) return;
    if (Math.abs(e.clientX - d.x) > 3) d.moved = true;
    if (!d.moved) return;
    const ms = msAt(e.clientX);
    onPick(Math.min(d.anchorMs, ms), Math.max(d.anchorMs, ms));
  };
  const onPointerUp = (e: React.PointerEvent<HTMLDivElement>) => {
    const d = drag.current;
    drag.current = null;
    if (!d) return;
    if (d.moved) {
      setAwaitingEnd(false);
      return;
    }
    // A click: first the start, then the end (swapped if the second click lies before the first).
    const ms = msAt(e.clientX);
    if (!awaitingEnd || selection.startMs === null) {
      onPick(ms, null);
      setAwaitingEnd(true);
    } else {
      onPick(Math.min(selection.startMs, ms), Math.max(selection.startMs, ms));
      setAwaitingEnd(false);
    }
  };

  const sel = selection.startMs !== null ? { a: selection.startMs, b: selection.endMs ?? selection.startMs } : null;
  return (
    <div className="mt-3">
      <div className="mb-1 flex justify-between text-xs text-muted tabular">
        <span>run {run.number} start {stamp(run.startMs)} UTC</span>
        <span>{run.open ? `still running (now ${hhmmss(run.endMs)})` : `end ${stamp(run.endMs)} UTC`}</span>
      </div>
      <div
        ref={bar}
        data-testid="run-timeline"
        role="group"
        aria-label={`Timeline of run ${run.number}: drag across it, or click the start and then the end, to pick the flag's interval`}
        className="relative h-12 cursor-crosshair touch-none select-none rounded border border-line bg-good/15"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
      >
        {flags.map((f) => (
          <div
            key={f.id}
            title={`${f.verdict} · ${f.state} · ${f.subsystemLabel} · ${hhmmss(f.startMs)}–${hhmmss(f.endMs)} UTC`}
            className={`absolute top-1 bottom-1 rounded-sm ${flagStyle(f)}`}
            style={{ left: `${pct(f.startMs, run)}%`, width: `${Math.max(0.4, pct(f.endMs, run) - pct(f.startMs, run))}%` }}
          />
        ))}
        {sel && (
          <div
            data-testid="timeline-selection"
            className="pointer-events-none absolute top-0 bottom-0 rounded-sm border-2 border-accent bg-accent/25"
            style={{ left: `${pct(sel.a, run)}%`, width: `${Math.max(0.3, pct(sel.b, run) - pct(sel.a, run))}%` }}
          />
        )}
      </div>
      <div className="mt-1 flex justify-between text-xs text-muted tabular" aria-hidden>
        {[0, 0.25, 0.5, 0.75, 1].map((f) => (
          <span key={f}>{hhmmss(run.startMs + f * (run.endMs - run.startMs))}</span>
        ))}
      </div>
      <p className="mt-1 text-xs text-muted">
        {awaitingEnd ? "Start picked: click the end on the bar (or type it below)." : "Drag across the bar, or click the start and then the end."}{" "}
        Legend: <span className="rounded-sm bg-bad/45 px-1">✕ exclude</span> <span className="rounded-sm bg-info/35 px-1">! caution</span>{" "}
        <span className="rounded-sm border-2 border-dashed border-warn px-1">◌ proposed</span> <span className="rounded-sm border-2 border-accent px-1">picked</span>
      </p>
      {flags.length === 0 ? (
        <p className="mt-1 text-xs text-muted">No flags on this run yet.</p>
      ) : (
        <ul className="mt-1 space-y-0.5 text-xs" aria-label={`Flags on run ${run.number}`}>
          {flags.map((f) => (
            <li key={f.id} className="tabular">
              {f.verdict === "exclude" ? "✕ exclude" : "! caution"} · {f.state === "proposed" ? "◌ proposed" : f.state === "confirmed" ? "✓ confirmed" : "⊘ withdrawn"} ·{" "}
              {f.subsystemLabel} · {hhmmss(f.startMs)}–{hhmmss(f.endMs)} UTC (flag {f.id})
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
