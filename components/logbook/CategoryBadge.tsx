/** A category as glyph + word (never colour alone). */
import type { EntryCategory } from "@/db/schema/logbook";
import { Badge, type Tone } from "@/components/ui/Badge";
import { CATEGORY_GLYPHS, CATEGORY_LABELS } from "./categories";

const TONE: Partial<Record<EntryCategory, Tone>> = { incident: "bad", cryogenics: "info", radiation: "warn", shift_summary: "accent" };

/** The category chip used in the feed and on entry pages. */
export function CategoryBadge({ category }: { category: EntryCategory }) {
  return <Badge tone={TONE[category] ?? "muted"} icon={CATEGORY_GLYPHS[category]}>{CATEGORY_LABELS[category]}</Badge>;
}
