/** Live fraction as a small bar plus the number, so the figure is readable without the colour. */
import { formatPercent } from "./format";

/** A thin horizontal bar filled to the live fraction; "open" while the run has no end yet. */
export function LiveFractionBar({ fraction, wide = false }: { fraction: number | null; wide?: boolean }) {
  if (fraction === null) return <span className="text-xs text-muted">open</span>;
  const pct = Math.max(0, Math.min(1, fraction)) * 100;
  return (
    <span className="inline-flex items-center gap-2">
      <span
        role="meter"
        aria-label="Live fraction"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Number(pct.toFixed(1))}
        className={`relative inline-block h-1.5 overflow-hidden rounded bg-raised ${wide ? "w-48" : "w-12"}`}
      >
        <span className="absolute inset-y-0 left-0 bg-good" style={{ width: `${pct}%` }} />
      </span>
      <span className="tabular text-xs">{formatPercent(fraction)}</span>
    </span>
  );
}
