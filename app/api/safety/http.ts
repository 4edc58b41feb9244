/** Helpers of the safety and source route handlers: bodies come from lib/server/api; ids read leniently here. */
export { parseOr400, readJson as jsonBody } from "@/lib/server/api";

/** A positive integer id from a route segment, or null. */
export function idParam(raw: string): number | null {
  const n = Number(raw);
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}
