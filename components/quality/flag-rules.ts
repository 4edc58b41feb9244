/**
 * The two-person rule for bad-time flags, as a pure decision shared by the server (which enforces it)
 * and the pages (which hide buttons that would be refused). No database or framework code here.
 */
import type { FlagState } from "@/db/schema/quality";

/** What someone wants to do to an existing flag. */
export type FlagStep = "confirm" | "withdraw";

/** Why a step is refused; stable codes that API clients can switch on. */
export type FlagRefusalCode = "own_flag" | "already_confirmed" | "already_withdrawn";

/** Outcome of asking whether a step is allowed: allowed, or refused with an HTTP status and plain words. */
export type FlagStepDecision =
  | { allowed: true }
  | { allowed: false; code: FlagRefusalCode; status: 403 | 409; reason: string };

/** The parts of a flag the rule looks at. */
export interface FlagForRule {
  state: FlagState;
  proposedBy: number;
}

/** Refusal raised by db/flags.ts when a step breaks the rule (or the flag moved on meanwhile). */
export class FlagStepError extends Error {
  readonly code: FlagRefusalCode;
  readonly status: 403 | 409;
  readonly field = "id";
  constructor(code: FlagRefusalCode, status: 403 | 409, reason: string) {
    super(reason);
    this.name = "FlagStepError";
    this.code = code;
    this.status = status;
  }
}

/**
 * Whether `actorId` may take `step` on `flag`.
 * Confirming needs a proposed flag and a second person (the proposer never confirms their own);
 * withdrawing needs a flag that is not already withdrawn, and may be done by anyone allowed to manage flags,
 * the proposer included (taking back one's own proposal is no risk to the rule).
 */
export function decideFlagStep(step: FlagStep, flag: FlagForRule, actorId: number): FlagStepDecision {
  if (flag.state === "withdrawn") {
    return { allowed: false, code: "already_withdrawn", status: 409, reason: "this flag has been withdrawn; propose a new one if the time is bad after all" };
  }
  if (step === "withdraw") return { allowed: true };
  if (flag.state === "confirmed") {
    return { allowed: false, code: "already_confirmed", status: 409, reason: "this flag is already confirmed" };
  }
  if (flag.proposedBy === actorId) {
    return {
      allowed: false,
      code: "own_flag",
      status: 403,
      reason: "you proposed this flag; another detector expert must confirm it (two-person rule)",
    };
  }
  return { allowed: true };
}

/** Throws FlagStepError when decideFlagStep refuses the step. */
export function assertFlagStep(step: FlagStep, flag: FlagForRule, actorId: number): void {
  const decision = decideFlagStep(step, flag, actorId);
  if (!decision.allowed) throw new FlagStepError(decision.code, decision.status, decision.reason);
}
