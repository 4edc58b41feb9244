/** The pieces every route handler shares: JSON bodies checked by zod, ids from the path, people-only steps. */
import type { NextResponse } from "next/server";
import type { z } from "zod";
import { apiError } from "@/lib/auth/guards";
import type { Principal } from "@/lib/auth/decide";
import { firstIssue } from "@/lib/validation/zod-issue";

/** The request's JSON body, or a 400 on field "body" when it is not JSON. */
export async function readJson(req: Request): Promise<unknown | NextResponse> {
  try {
    return await req.json();
  } catch {
    return apiError(400, "body: the request body must be JSON", { field: "body", reason: "must be JSON" });
  }
}

/** A value checked against a schema, or a 400 naming the first bad field and why. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown): z.output<S> | NextResponse {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const { error, field, reason } = firstIssue(parsed.error);
  return apiError(400, error, { field, reason });
}

/** The JSON body checked against a schema, or a 400. */
export async function readBody<S extends z.ZodType>(req: Request, schema: S): Promise<z.output<S> | NextResponse> {
  const raw = await readJson(req);
  return raw instanceof Response ? (raw as NextResponse) : parseOr400(schema, raw);
}

/** A positive whole-number id from a route segment, or a 400 on that field. */
export function pathId(raw: string, field = "id"): number | NextResponse {
  return /^\d{1,9}$/.test(raw) && Number(raw) > 0 ? Number(raw) : apiError(400, `${field}: "${raw}" is not a record id`, { field });
}

/** The signed-in person's id for steps a machine token may not take (they record who did it), or a 403. */
export function personId(who: Principal, what: string): number | NextResponse {
  return who.kind === "user" ? who.id : apiError(403, `${what} are changed by people, not machine tokens`);
}
