/**
 * Input schemas for flags, subsystems and periods, shared by the route handlers and the server actions so a
 * form and the API refuse the same things with the same words. Pure zod; no database here.
 */
import { z } from "zod";
import { FLAG_VERDICTS } from "@/db/schema/quality";
import { RUN_TYPES } from "@/db/schema/runs";

/** An ISO 8601 instant with an explicit zone ("Z" or "+01:00"), read as a Date. */
export const isoInstant = z.iso
  .datetime({ offset: true, message: "must be an ISO 8601 time with a zone, e.g. 2032-01-05T10:00:00Z" })
  .transform((s) => new Date(s));

const endAfterStart = { message: "must be after the start", path: ["endAt"] };

/**
 * True unless both ends are valid times in the wrong order. zod runs object refinements even when a field already
 * failed, so a bad time must not reach `.getTime()` here; its own issue is reported instead.
 */
function inOrder(p: { startAt?: unknown; endAt?: unknown }): boolean {
  if (!(p.startAt instanceof Date) || !(p.endAt instanceof Date)) return true;
  return p.endAt.getTime() > p.startAt.getTime();
}

/** A proposed bad-time flag. */
export const flagProposalSchema = z
  .object({
    startAt: isoInstant,
    endAt: isoInstant,
    subsystem: z.string().trim().min(1, "pick a subsystem").max(40),
    verdict: z.enum(FLAG_VERDICTS, { message: 'must be "exclude" or "caution"' }),
    reason: z.string().trim().min(3, "say why this time is bad (a few words at least)").max(4000),
  })
  .refine(inOrder, endAfterStart);
export type FlagProposal = z.infer<typeof flagProposalSchema>;

/** Confirming a flag: an optional comment. */
export const flagConfirmSchema = z.object({ comment: z.string().trim().max(2000).optional() });

/** Withdrawing a flag: a reason is required, so the history says why. */
export const flagWithdrawSchema = z.object({
  reason: z.string().trim().min(3, "say why the flag is withdrawn").max(2000),
});

/** A new subsystem: a short code (lower-case letters, digits, dashes) and a label. */
export const subsystemSchema = z.object({
  code: z
    .string()
    .trim()
    .toLowerCase()
    .regex(/^[a-z0-9][a-z0-9-]{0,39}$/, "use lower-case letters, digits and dashes (at most 40)"),
  label: z.string().trim().min(2, "give the subsystem a readable name").max(80),
});

const periodFields = {
  name: z.string().trim().min(1, "name the period").max(120),
  startAt: isoInstant,
  endAt: isoInstant,
  runTypes: z.array(z.enum(RUN_TYPES)).min(1, "pick at least one run type"),
  signalAcceptance: z.number({ message: "must be a number from 0 to 1" }).min(0, "must be from 0 to 1").max(1, "must be from 0 to 1"),
  notes: z.string().max(10_000).nullable().optional(),
  blind: z.boolean(),
  /** One detector's runs (their target masses differ); null or absent counts every detector. */
  detector: z.string().trim().min(1, "name the detector, or leave it empty for every detector").max(60).nullable().optional(),
};

/** A new data-quality period. */
export const periodCreateSchema = z
  .object({ ...periodFields, blind: periodFields.blind.default(false) })
  .refine(inOrder, endAfterStart);
export type PeriodCreate = z.infer<typeof periodCreateSchema>;

/** Changes to a period: any subset of the fields (the span is checked again against the stored one). */
export const periodPatchSchema = z
  .object(periodFields)
  .partial()
  .refine(inOrder, endAfterStart);
export type PeriodPatch = z.infer<typeof periodPatchSchema>;

export { firstIssue } from "@/lib/validation/zod-issue";
