/**
 * Helpers of the flag and period route handlers: bodies and ids come from lib/server/api; here the known
 * refusals of db/flags.ts, db/periods.ts and lib/exposure become JSON answers.
 */
import { NextResponse } from "next/server";
import { apiError } from "@/lib/auth/guards";
import type { Principal } from "@/lib/auth/decide";
import { FlagRequestError } from "@/db/flags";
import { PeriodRequestError } from "@/db/periods";
import { FlagStepError } from "@/components/quality/flag-rules";
import { ExposureInputError } from "@/lib/exposure";
import { personId } from "@/lib/server/api";

export { pathId, readBody } from "@/lib/server/api";

/** Flags carry a person as proposer or confirmer, so machine tokens cannot take these steps. */
export function userOnly(p: Principal): number | NextResponse {
  return personId(p, "flags and periods");
}

/** A JSON answer for the refusals the data modules raise; anything else is re-thrown. */
export function knownError(err: unknown): NextResponse {
  if (err instanceof FlagStepError) return apiError(err.status, err.message, { code: err.code, field: err.field });
  if (err instanceof FlagRequestError || err instanceof PeriodRequestError) {
    return apiError(err.status, err.message, { code: err.code, field: err.field });
  }
  if (err instanceof ExposureInputError) {
    // The ledger itself is inconsistent (e.g. a run with more live time than duration): name the record.
    return apiError(422, `cannot compute exposure: ${err.message}`, { code: err.code, record: err.record, field: err.field });
  }
  throw err;
}
