import { describe, it, expect } from "vitest";
import {
  REVIEW_MOVES, REVIEW_STATES, REVIEW_STATE_DISPLAY, ReviewMoveError, belongsInQueue, canMove, checkMove, reopenComment, stateAfterRevision,
  type ReviewState,
} from "@/components/safety/review-flow";

// Expected values restate the queue rules of the safety review issue (the product's own spec):
// awaiting review → acknowledged, or → follow-up needed → closed; every move needs a comment;
// a new revision after review puts the item back to awaiting review.

describe("allowed moves", () => {
  const allowed: { from: ReviewState; to: ReviewState }[] = [
    { from: "awaiting_review", to: "acknowledged" },
    { from: "awaiting_review", to: "follow_up" },
    { from: "follow_up", to: "closed" },
  ];
  const every = REVIEW_STATES.flatMap((from) => REVIEW_STATES.map((to) => ({ from, to })));
  it.each(every.map((m) => ({ ...m, label: `${m.from} → ${m.to}`, ok: allowed.some((a) => a.from === m.from && a.to === m.to) })))(
    "$label allowed: $ok",
    ({ from, to, ok }) => {
      expect(canMove(from, to)).toBe(ok);
    },
  );

  it("acknowledged and closed are end states for officers (only a revision re-opens them)", () => {
    expect(REVIEW_MOVES.acknowledged).toEqual([]);
    expect(REVIEW_MOVES.closed).toEqual([]);
  });
});

describe("checking a requested move", () => {
  it.each([
    { label: "acknowledge with a comment", from: "awaiting_review" as const, to: "acknowledged", comment: "  read with the shift  ", result: "read with the shift" },
    { label: "close a follow-up", from: "follow_up" as const, to: "closed", comment: "readings added", result: "readings added" },
  ])("$label", ({ from, to, comment, result }) => {
    expect(checkMove(from, to, comment)).toBe(result);
  });

  it.each([
    { label: "empty comment", from: "awaiting_review" as const, to: "acknowledged", comment: "", code: "COMMENT_REQUIRED", field: "comment" },
    { label: "whitespace comment", from: "awaiting_review" as const, to: "follow_up", comment: "   \n", code: "COMMENT_REQUIRED", field: "comment" },
    { label: "missing comment", from: "awaiting_review" as const, to: "follow_up", comment: undefined, code: "COMMENT_REQUIRED", field: "comment" },
    { label: "skip straight to closed", from: "awaiting_review" as const, to: "closed", comment: "x", code: "NOT_ALLOWED", field: "to" },
    { label: "close an acknowledged item", from: "acknowledged" as const, to: "closed", comment: "x", code: "NOT_ALLOWED", field: "to" },
    { label: "unknown state", from: "awaiting_review" as const, to: "done", comment: "x", code: "UNKNOWN_STATE", field: "to" },
  ])("refuses: $label", ({ from, to, comment, code, field }) => {
    let caught: unknown;
    try {
      checkMove(from, to, comment);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(ReviewMoveError);
    expect((caught as ReviewMoveError).code).toBe(code);
    expect((caught as ReviewMoveError).field).toBe(field);
  });
});

describe("a new revision of the entry", () => {
  it.each([
    { label: "re-opens an acknowledged item", from: "acknowledged" as const, reopen: true, state: "awaiting_review" },
    { label: "re-opens a follow-up item (the writer answered)", from: "follow_up" as const, reopen: true, state: "awaiting_review" },
    { label: "re-opens a closed item", from: "closed" as const, reopen: true, state: "awaiting_review" },
    { label: "leaves an item already awaiting review", from: "awaiting_review" as const, reopen: false, state: "awaiting_review" },
  ])("$label", ({ from, reopen, state }) => {
    expect(stateAfterRevision(from)).toEqual({ reopen, state });
  });

  it("names the revision in the event comment", () => {
    expect(reopenComment(3)).toBe("re-opened by revision 3");
  });
});

describe("which entries enter the queue", () => {
  it.each([
    { label: "cryogenics", category: "cryogenics", marked: false, inQueue: true },
    { label: "radiation", category: "radiation", marked: false, inQueue: true },
    { label: "incident", category: "incident", marked: false, inQueue: true },
    { label: "run note", category: "run_note", marked: false, inQueue: false },
    { label: "maintenance marked for review", category: "maintenance", marked: true, inQueue: true },
    { label: "calibration (not a safety category)", category: "calibration", marked: false, inQueue: false },
  ])("$label → $inQueue", ({ category, marked, inQueue }) => {
    expect(belongsInQueue(category, marked)).toBe(inQueue);
  });
});

describe("state display", () => {
  it.each([
    { state: "awaiting_review" as const, label: "Awaiting review" },
    { state: "acknowledged" as const, label: "Acknowledged" },
    { state: "follow_up" as const, label: "Follow-up needed" },
    { state: "closed" as const, label: "Closed" },
  ])("$state reads \"$label\" with an icon", ({ state, label }) => {
    expect(REVIEW_STATE_DISPLAY[state].label).toBe(label);
    expect(REVIEW_STATE_DISPLAY[state].icon.length).toBeGreaterThan(0);
  });

  it("gives every state its own icon, so no two are told apart by colour alone", () => {
    const icons = REVIEW_STATES.map((s) => REVIEW_STATE_DISPLAY[s].icon);
    expect(new Set(icons).size).toBe(REVIEW_STATES.length);
  });
});
