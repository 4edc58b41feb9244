/**
 * The safety review queue's states and the moves between them, as data. Pages, route handlers and the
 * database layer all read this one table, so the rules cannot drift apart. No framework imports: unit-tested.
 */
import { REVIEW_STATES, type ReviewState } from "@/db/schema/safety";
import type { Tone } from "@/components/ui/Badge";

export { REVIEW_STATES, type ReviewState };

/** Entry categories that always enter the queue (besides entries marked "needs safety review"). */
export const SAFETY_CATEGORIES = ["cryogenics", "radiation", "incident"] as const;

/** Moves a safety officer may make from each state; each needs a comment. */
export const REVIEW_MOVES: Readonly<Record<ReviewState, readonly ReviewState[]>> = Object.freeze({
  awaiting_review: ["acknowledged", "follow_up"],
  acknowledged: [],
  follow_up: ["closed"],
  closed: [],
});

/** States from which a new revision of the entry puts the item back to "awaiting review". */
export const REOPEN_ON_REVISION_FROM: readonly ReviewState[] = ["acknowledged", "follow_up", "closed"];

/** States that still need someone to act (the digest and the "open" filter count these). */
export const OPEN_STATES: readonly ReviewState[] = ["awaiting_review", "follow_up"];

/** How each state is shown: word, icon and tone (never colour alone). */
export const REVIEW_STATE_DISPLAY: Readonly<Record<ReviewState, { label: string; icon: string; tone: Tone }>> = Object.freeze({
  awaiting_review: { label: "Awaiting review", icon: "◔", tone: "warn" },
  acknowledged: { label: "Acknowledged", icon: "✓", tone: "good" },
  follow_up: { label: "Follow-up needed", icon: "↻", tone: "bad" },
  closed: { label: "Closed", icon: "■", tone: "muted" },
});

/** The verb on the button that makes a move into `to`. */
export const MOVE_VERBS: Readonly<Record<ReviewState, string>> = Object.freeze({
  awaiting_review: "Put back in the queue",
  acknowledged: "Acknowledge",
  follow_up: "Ask for follow-up",
  closed: "Close",
});

/** Why a requested move was refused. */
export class ReviewMoveError extends Error {
  readonly code: "NOT_ALLOWED" | "COMMENT_REQUIRED" | "UNKNOWN_STATE";
  readonly field: "to" | "comment";

  constructor(code: ReviewMoveError["code"], field: ReviewMoveError["field"], reason: string) {
    super(reason);
    this.name = "ReviewMoveError";
    this.code = code;
    this.field = field;
  }
}

/** True when `value` names a review state. */
export function isReviewState(value: unknown): value is ReviewState {
  return typeof value === "string" && (REVIEW_STATES as readonly string[]).includes(value);
}

/** True when a safety officer may move an item from `from` to `to`. */
export function canMove(from: ReviewState, to: ReviewState): boolean {
  return REVIEW_MOVES[from].includes(to);
}

/** Checks a requested move and its comment; returns the trimmed comment or throws ReviewMoveError. */
export function checkMove(from: ReviewState, to: unknown, comment: unknown): string {
  if (!isReviewState(to)) throw new ReviewMoveError("UNKNOWN_STATE", "to", `"${String(to)}" is not a review state`);
  if (!canMove(from, to)) {
    const allowed = REVIEW_MOVES[from].map((s) => REVIEW_STATE_DISPLAY[s].label).join(", ") || "none";
    throw new ReviewMoveError(
      "NOT_ALLOWED",
      "to",
      `an item that is "${REVIEW_STATE_DISPLAY[from].label}" cannot become "${REVIEW_STATE_DISPLAY[to].label}" (allowed: ${allowed})`,
    );
  }
  const text = typeof comment === "string" ? comment.trim() : "";
  if (text.length === 0) throw new ReviewMoveError("COMMENT_REQUIRED", "comment", "every move needs a comment saying what was checked");
  return text;
}

/** True when an entry of this category (or marked for review) belongs in the queue. */
export function belongsInQueue(category: string, needsSafetyReview: boolean): boolean {
  return needsSafetyReview || (SAFETY_CATEGORIES as readonly string[]).includes(category);
}

/** What a new revision does to an existing queue item: re-open it, or leave it as it is. */
export function stateAfterRevision(current: ReviewState): { reopen: boolean; state: ReviewState } {
  return REOPEN_ON_REVISION_FROM.includes(current) ? { reopen: true, state: "awaiting_review" } : { reopen: false, state: current };
}

/** The comment on the event a revision writes when it re-opens an item. */
export function reopenComment(revision: number): string {
  return `re-opened by revision ${revision}`;
}
