/** Small helpers the safety and source route handlers share: JSON bodies, zod errors as `{ error, field }`, id params. */
import { NextResponse } from "next/server";
import type { z } from "zod";
import { apiError } from "@/lib/auth/guards";

/** The request's JSON body, or a 400 response when it is not JSON. */
export async function jsonBody(req: Request): Promise<unknown | NextResponse> {
  try {
    return await req.json();
  } catch {
    return apiError(400, "the body must be JSON", { field: "body" });
  }
}

/** Parse with a zod schema; a failure becomes 400 naming the first bad field and why. */
export function parseOr400<T>(schema: z.ZodType<T>, value: unknown): T | NextResponse {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  const field = issue?.path.map(String).join(".") || "body";
  return apiError(400, `${field}: ${issue?.message ?? "invalid"}`, { field });
}

/** A positive integer id from a route segment, or null. */
export function idParam(raw: string): number | null {
  const n = Number(raw);
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}
