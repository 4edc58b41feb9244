/** Turns source-layer errors into the JSON error responses the source routes give. */
import type { NextResponse } from "next/server";
import { SourceError } from "@/db/sources";
import { apiError } from "@/lib/auth/guards";

const STATUS: Record<SourceError["code"], number> = { NOT_FOUND: 404, DUPLICATE_SERIAL: 409, ALREADY_OUT: 409, NOT_OUT: 409, BAD_DATE: 400, NOT_SEALED: 409 };

/** A SourceError as `{ error, field }` with its status; anything else is rethrown. */
export function sourceErrorResponse(err: unknown): NextResponse {
  if (err instanceof SourceError) return apiError(STATUS[err.code], err.message, { field: err.field });
  throw err;
}

/** Run numbers not in the runs table, as a 400 on field runNumbers (null when all exist). */
export function unknownRunsResponse(asked: number[], existing: number[]): NextResponse | null {
  const missing = asked.filter((n) => !existing.includes(n));
  return missing.length ? apiError(400, `runNumbers: no run ${missing.join(", ")}`, { field: "runNumbers" }) : null;
}
