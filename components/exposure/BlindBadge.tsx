/** Whether a period's analysis is blind, as icon + word. */
import { Badge } from "@/components/ui/Badge";

/** "◐ blind" or "○ not blind". */
export function BlindBadge({ blind }: { blind: boolean }) {
  return blind ? (
    <Badge tone="accent" icon="◐" title="Observed counts stay hidden until the unblinding is recorded">blind</Badge>
  ) : (
    <Badge tone="muted" icon="○" title="Not a blind analysis">not blind</Badge>
  );
}
