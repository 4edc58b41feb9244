/** Run states as icon + word badges: data quality, run status and run type. */
import { Badge, type Tone } from "@/components/ui/Badge";
import type { RunQuality } from "@/lib/exposure";
import type { RunStatus } from "@/lib/runs";

const QUALITY: Record<RunQuality, { tone: Tone; icon: string; title: string }> = {
  good: { tone: "good", icon: "✓", title: "No confirmed excluding flag touches this run" },
  "partly excluded": { tone: "warn", icon: "◐", title: "Confirmed excluding flags remove part of this run" },
  excluded: { tone: "bad", icon: "✕", title: "Confirmed excluding flags cover the whole run" },
  open: { tone: "info", icon: "○", title: "The run is still being taken" },
};

const STATUS: Record<RunStatus, { tone: Tone; icon: string }> = {
  running: { tone: "accent", icon: "▶" },
  ended: { tone: "muted", icon: "■" },
  aborted: { tone: "bad", icon: "⏹" },
};

/** Data-quality status of a run against the confirmed excluding flags. */
export function QualityBadge({ quality }: { quality: RunQuality }) {
  const q = QUALITY[quality];
  return (
    <Badge tone={q.tone} icon={q.icon} title={q.title}>
      {quality}
    </Badge>
  );
}

/** Whether the run is running, ended or aborted. */
export function StatusBadge({ status }: { status: RunStatus }) {
  const s = STATUS[status];
  return (
    <Badge tone={s.tone} icon={s.icon}>
      {status}
    </Badge>
  );
}
