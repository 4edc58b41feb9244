import { NextResponse } from "next/server";
import { apiError, guardApi } from "@/lib/auth/guards";
import { LimitInputError, computeLimit } from "@/lib/limits";
import { REQUEST_FIELD, firstIssue, limitRequestSchema } from "@/components/limits/inputs";

export const dynamic = "force-dynamic";

/**
 * POST /api/limits { n, b, cl, method } → the LimitResult of lib/limits computeLimit:
 * { method, observed, background, cl, kind: "upper-limit" | "interval" | "no-limit", lower, upper (null for
 * "no-limit"), rawUpper?, note? }. Stateless; any signed-in person. 400 { error, field, reason } on bad input.
 */
export async function POST(req: Request) {
  const who = await guardApi(req, "periods.read");
  if (who instanceof NextResponse) return who;
  let raw: unknown;
  try {
    raw = await req.json();
  } catch {
    return apiError(400, "body: the request body must be JSON", { field: "body", reason: "the request body must be JSON" });
  }
  const parsed = limitRequestSchema.safeParse(raw);
  if (!parsed.success) {
    const { error, field, reason } = firstIssue(parsed.error);
    return apiError(400, error, { field, reason });
  }
  const { n, b, cl, method } = parsed.data;
  try {
    return NextResponse.json(computeLimit(method, n, b, cl));
  } catch (err) {
    if (!(err instanceof LimitInputError)) throw err;
    // e.g. Feldman–Cousins refuses n + b beyond what it can construct; name the request's own field.
    const field = REQUEST_FIELD[err.field] ?? err.field;
    return apiError(400, `${field}: ${err.reason}`, { field, reason: err.reason });
  }
}
