import { describe, it, expect } from "vitest";
import { assertFlagStep, decideFlagStep, FlagStepError, type FlagForRule, type FlagStep } from "@/components/quality/flag-rules";

// The two-person rule of the product brief (../shared/PRODUCT.md): a flag is "proposed by one expert, confirmed by
// another, or withdrawn". Experts 7 and 9 are two different people; 7 proposed every flag below.
const PROPOSER = 7;
const OTHER = 9;

const cases: { label: string; step: FlagStep; flag: FlagForRule; actor: number; allowed: boolean; code?: string; status?: number }[] = [
  // brief: confirmation is by another expert
  { label: "a second expert confirms a proposed flag", step: "confirm", flag: { state: "proposed", proposedBy: PROPOSER }, actor: OTHER, allowed: true },
  // brief: the proposer cannot confirm their own (403: the person is not allowed, common practice for HTTP)
  { label: "the proposer cannot confirm their own flag", step: "confirm", flag: { state: "proposed", proposedBy: PROPOSER }, actor: PROPOSER, allowed: false, code: "own_flag", status: 403 },
  // a confirmed flag has no second confirmation (409 conflict with the current state, common practice for HTTP)
  { label: "a confirmed flag cannot be confirmed again", step: "confirm", flag: { state: "confirmed", proposedBy: PROPOSER }, actor: OTHER, allowed: false, code: "already_confirmed", status: 409 },
  { label: "a withdrawn flag cannot be confirmed", step: "confirm", flag: { state: "withdrawn", proposedBy: PROPOSER }, actor: OTHER, allowed: false, code: "already_withdrawn", status: 409 },
  // brief: "or withdrawn" — by any expert, the proposer taking back a proposal included
  { label: "the proposer may withdraw their own proposal", step: "withdraw", flag: { state: "proposed", proposedBy: PROPOSER }, actor: PROPOSER, allowed: true },
  { label: "another expert may withdraw a confirmed flag", step: "withdraw", flag: { state: "confirmed", proposedBy: PROPOSER }, actor: OTHER, allowed: true },
  { label: "a withdrawn flag cannot be withdrawn twice", step: "withdraw", flag: { state: "withdrawn", proposedBy: PROPOSER }, actor: OTHER, allowed: false, code: "already_withdrawn", status: 409 },
];

describe("two-person rule for bad-time flags", () => {
  it.each(cases)("$label", ({ step, flag, actor, allowed, code, status }) => {
    const decision = decideFlagStep(step, flag, actor);
    expect(decision.allowed).toBe(allowed);
    if (!decision.allowed) {
      expect(decision.code).toBe(code);
      expect(decision.status).toBe(status);
      expect(decision.reason.length).toBeGreaterThan(10);
    }
  });

  it.each(cases.filter((c) => !c.allowed))("assertFlagStep throws a typed error: $label", ({ step, flag, actor, code, status }) => {
    let caught: unknown;
    try {
      assertFlagStep(step, flag, actor);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(FlagStepError);
    expect((caught as FlagStepError).code).toBe(code);
    expect((caught as FlagStepError).status).toBe(status);
  });

  it("the refusal to the proposer names the rule in plain words", () => {
    const d = decideFlagStep("confirm", { state: "proposed", proposedBy: PROPOSER }, PROPOSER);
    // wording required by the issue: "the proposer cannot confirm their own (server-enforced, clear message)"
    expect(!d.allowed && d.reason).toMatch(/another detector expert must confirm.*two-person rule/);
  });
});
