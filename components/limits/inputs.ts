/**
 * Input schemas of the limits API and the recording form, so both refuse the same things with the same words.
 * Field names are the request's own (n, b for the stateless calculator; observed, background for a period).
 */
import { z } from "zod";
import { LIMIT_METHODS } from "@/db/schema/quality";
import { LimitInputError, type LimitField } from "@/lib/limits";
import { parseClPercent } from "@/lib/limits-view";
import { firstIssue } from "@/lib/validation/zod-issue";

const methodSchema = z.enum(LIMIT_METHODS, { message: `must be one of ${LIMIT_METHODS.join(", ")}` });
const clSchema = z
  .number({ message: "must be a number strictly between 0 and 1, e.g. 0.9" })
  .gt(0, "must be strictly between 0 and 1, e.g. 0.9")
  .lt(1, "must be strictly between 0 and 1, e.g. 0.9");
const countSchema = z
  .number({ message: "must be a whole number of events ≥ 0" })
  .int("must be a whole number of events ≥ 0")
  .min(0, "must be a whole number of events ≥ 0");
const backgroundSchema = z.number({ message: "must be a number of events ≥ 0" }).min(0, "must be a number of events ≥ 0");

/** POST /api/limits: one stateless limit computation. */
export const limitRequestSchema = z.object({ n: countSchema, b: backgroundSchema, cl: clSchema, method: methodSchema });
export type LimitRequest = z.infer<typeof limitRequestSchema>;

/** GET /api/periods/{id}/limit query: method and CL, both optional (the period's quoted ones by default). */
export const periodLimitQuerySchema = z.object({
  method: methodSchema.optional(),
  cl: z.coerce.number({ message: "must be a number strictly between 0 and 1, e.g. 0.9" }).pipe(clSchema).optional(),
});

/** PATCH /api/periods/{id}/limit: what a convener records; absent keys stay, null clears. */
export const countingPatchSchema = z.object({
  observed: countSchema.nullable().optional(),
  background: backgroundSchema.nullable().optional(),
  backgroundNote: z.string().max(4000, "keep the note under 4000 characters").nullable().optional(),
  cl: clSchema.optional(),
  method: methodSchema.optional(),
});
export type CountingPatchInput = z.infer<typeof countingPatchSchema>;

export { firstIssue };

/** The calculator's field names as the stateless request spells them. */
export const REQUEST_FIELD: Partial<Record<LimitField, string>> = { observed: "n", background: "b", cl: "cl", method: "method" };

/** The recording form's fields as submitted (a disabled count field is not submitted at all). */
export type CountingFormFields = {
  observed?: string;
  background?: string;
  backgroundNote?: string;
  clPercent?: string;
  method?: string;
};

function numberOrNull(text: string): number | null {
  const t = text.trim().replace(",", ".");
  return t === "" ? null : Number(t);
}

/**
 * Reads the recording form into a counting patch: empty count or background clears it, the CL is typed in
 * percent; then the same schema as the API checks it. Returns the first problem with its field.
 */
export function countingPatchFromForm(f: CountingFormFields): { ok: true; patch: CountingPatchInput } | { ok: false; field: string; reason: string } {
  let cl: number | undefined;
  if (f.clPercent !== undefined) {
    try {
      cl = parseClPercent(f.clPercent);
    } catch (err) {
      if (err instanceof LimitInputError) return { ok: false, field: "cl", reason: err.reason };
      throw err;
    }
  }
  const parsed = countingPatchSchema.safeParse({
    observed: f.observed === undefined ? undefined : numberOrNull(f.observed),
    background: f.background === undefined ? undefined : numberOrNull(f.background),
    backgroundNote: f.backgroundNote === undefined ? undefined : f.backgroundNote.trim() || null,
    cl,
    method: f.method,
  });
  if (!parsed.success) {
    const { field, reason } = firstIssue(parsed.error);
    return { ok: false, field, reason };
  }
  return { ok: true, patch: parsed.data };
}
