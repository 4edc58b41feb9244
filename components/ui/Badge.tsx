/**
 * A state shown as icon + word + tone, never colour alone. Tones map to the theme's colour-blind-safe hues.
 */
export type Tone = "good" | "warn" | "bad" | "info" | "muted" | "accent";

const TONES: Record<Tone, string> = {
  good: "border-good/50 bg-good/10 text-good",
  warn: "border-warn/50 bg-warn/10 text-warn",
  bad: "border-bad/50 bg-bad/10 text-bad",
  info: "border-info/50 bg-info/10 text-info",
  muted: "border-line bg-raised text-muted",
  accent: "border-accent/50 bg-accent/10 text-accent",
};

/** A small labelled state chip. */
export function Badge({ tone, icon, children, title }: { tone: Tone; icon: string; children: React.ReactNode; title?: string }) {
  return (
    <span title={title} className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-1.5 py-0.5 text-xs font-medium ${TONES[tone]}`}>
      <span aria-hidden>{icon}</span>
      {children}
    </span>
  );
}
