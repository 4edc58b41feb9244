/** Icon + word badges for a flag's state and verdict (never colour alone). */
import { Badge, type Tone } from "@/components/ui/Badge";
import type { FlagState, FlagVerdict } from "@/db/schema/quality";

const STATES: Record<FlagState, { tone: Tone; icon: string; word: string; title: string }> = {
  proposed: { tone: "warn", icon: "◌", word: "proposed", title: "Awaiting confirmation by a second detector expert; not yet used for exposure" },
  confirmed: { tone: "good", icon: "✓", word: "confirmed", title: "Confirmed by a second detector expert; used for exposure" },
  withdrawn: { tone: "muted", icon: "⊘", word: "withdrawn", title: "Withdrawn; kept in the history, never used for exposure" },
};

const VERDICTS: Record<FlagVerdict, { tone: Tone; icon: string; word: string; title: string }> = {
  exclude: { tone: "bad", icon: "✕", word: "exclude", title: "Removes this time from exposure once confirmed" },
  caution: { tone: "info", icon: "!", word: "caution", title: "Shown beside the data; never removes time" },
};

/** The flag's state: proposed, confirmed or withdrawn. */
export function FlagStateBadge({ state }: { state: FlagState }) {
  const s = STATES[state];
  return <Badge tone={s.tone} icon={s.icon} title={s.title}>{s.word}</Badge>;
}

/** The flag's verdict: exclude or caution. */
export function VerdictBadge({ verdict }: { verdict: FlagVerdict }) {
  const v = VERDICTS[verdict];
  return <Badge tone={v.tone} icon={v.icon} title={v.title}>{v.word}</Badge>;
}
