/** Shared pieces of the entry and attachment route handlers: ids, JSON bodies, and errors as `{ error, field }`. */
import { NextResponse } from "next/server";
import { EntryNotFoundError, EntryRetractedError, StaleRevisionError } from "@/db/entries";
import { apiError } from "@/lib/auth/guards";
import type { Principal } from "@/lib/auth/decide";
import { LogbookInputError } from "@/lib/logbook/errors";
import { personId } from "@/lib/server/api";

export { pathId as idFrom, readJson as jsonBody } from "@/lib/server/api";

/** Writers are people, never machine tokens: the id of the signed-in user, or a 403 response. */
export function writerId(who: Principal): number | NextResponse {
  return personId(who, "logbook entries");
}

/** Map the logbook's typed errors to responses; anything else is rethrown. */
export function errorResponse(err: unknown): NextResponse {
  if (err instanceof StaleRevisionError) {
    return apiError(409, err.message, { code: err.code, currentRevision: err.currentRevision, baseRevision: err.baseRevision });
  }
  if (err instanceof EntryRetractedError) return apiError(409, err.message, { code: err.code });
  if (err instanceof EntryNotFoundError) return apiError(404, err.message);
  if (err instanceof LogbookInputError) return apiError(400, err.message, { field: err.field, code: err.code });
  throw err;
}
