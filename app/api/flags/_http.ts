/**
 * Small helpers shared by the flag and period route handlers: read a JSON body against a schema, read an id
 * from the path, and turn the known refusals of db/flags.ts, db/periods.ts and lib/exposure into JSON answers.
 */
import { NextResponse } from "next/server";
import type { z } from "zod";
import { apiError } from "@/lib/auth/guards";
import type { Principal } from "@/lib/auth/decide";
import { FlagRequestError } from "@/db/flags";
import { PeriodRequestError } from "@/db/periods";
import { FlagStepError } from "@/components/quality/flag-rules";
import { firstIssue } from "@/components/quality/inputs";
import { ExposureInputError } from "@/lib/exposure";

/** The parsed body, or a 400 naming the field and the reason. */
export async function readBody<S extends z.ZodType>(req: Request, schema: S): Promise<z.output<S> | NextResponse> {
  let raw: unknown;
  try {
    raw = await req.json();
  } catch {
    return apiError(400, "body: the request body must be JSON", { field: "body" });
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const { error, field } = firstIssue(parsed.error);
    return apiError(400, error, { field });
  }
  return parsed.data;
}

/** A positive integer id from the path, or a 400. */
export function pathId(value: string): number | NextResponse {
  const id = Number(value);
  if (!Number.isInteger(id) || id <= 0) return apiError(400, `id: "${value}" is not a record id`, { field: "id" });
  return id;
}

/** Flags carry a person as proposer or confirmer, so machine tokens cannot take these steps. */
export function userOnly(p: Principal): number | NextResponse {
  return p.kind === "user" ? p.id : apiError(403, "flags and periods are changed by people, not machine tokens");
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
