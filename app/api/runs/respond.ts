/**
 * How the runs and configurations API answers: JSON bodies, and the run errors mapped to status codes
 * (bad input 400 with the field, conflict 409 with the differing fields, unknown run 404).
 */
import { NextResponse } from "next/server";
import { apiError } from "@/lib/auth/guards";
import { RunConflictError, RunInputError, RunNotFoundError, MAX_RUN_NUMBER } from "@/lib/runs";

/** The request body as JSON; a body that is not JSON is bad input on the field "body". */
export async function jsonBody(req: Request): Promise<unknown> {
  try {
    return await req.json();
  } catch {
    throw new RunInputError("body", "is not valid JSON");
  }
}

/** The run number in the path; anything but a positive whole number is bad input on "number". */
export function runNumberParam(text: string): number {
  if (!/^\d{1,10}$/.test(text) || Number(text) < 1 || Number(text) > MAX_RUN_NUMBER) {
    throw new RunInputError("number", `must be a positive whole number up to ${MAX_RUN_NUMBER} (got "${text}")`);
  }
  return Number(text);
}

/** The error answer for the run errors; anything else is rethrown (a real fault, answered 500 by Next). */
export function runErrorResponse(err: unknown): NextResponse {
  if (err instanceof RunInputError) return apiError(400, err.message, { field: err.field, reason: err.reason });
  if (err instanceof RunConflictError) return apiError(409, err.message, { field: err.fields[0] ?? null, fields: err.fields, reason: err.reason });
  if (err instanceof RunNotFoundError) return apiError(404, err.message, { field: "number" });
  throw err;
}

/** A JSON reply that says whether it repeats an earlier answer (the body is the same either way). */
export function writeReply(body: unknown, status: number, replay: boolean): NextResponse {
  return NextResponse.json(body, { status, headers: { "x-deepshift-replay": replay ? "yes" : "no" } });
}
