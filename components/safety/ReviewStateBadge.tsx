import { Badge } from "@/components/ui/Badge";
import { REVIEW_STATE_DISPLAY, type ReviewState } from "./review-flow";

/** A review state as icon + word. */
export function ReviewStateBadge({ state }: { state: ReviewState }) {
  const d = REVIEW_STATE_DISPLAY[state];
  return <Badge tone={d.tone} icon={d.icon}>{d.label}</Badge>;
}
