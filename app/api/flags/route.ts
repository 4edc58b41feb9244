import { NextResponse } from "next/server";
import { z } from "zod";
import { apiError, guardApi } from "@/lib/auth/guards";
import { listFlags, proposeFlag } from "@/db/flags";
import { runForTimeline } from "@/db/exposure";
import { FLAG_STATES } from "@/db/schema/quality";
import { firstIssue, flagProposalSchema, isoInstant } from "@/components/quality/inputs";
import { knownError, readBody, userOnly } from "./_http";

export const dynamic = "force-dynamic";

const querySchema = z.object({
  state: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(",").map((x) => x.trim()) : undefined))
    .pipe(z.array(z.enum(FLAG_STATES)).optional()),
  subsystem: z.string().trim().min(1).optional(),
  from: isoInstant.optional(),
  to: isoInstant.optional(),
  run: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(5000).optional(),
});

/**
 * GET /api/flags?state=proposed,confirmed&subsystem=daq&from=ISO&to=ISO&run=N&limit=500
 * → { flags: FlagView[], run?: { number, type, status, startAt, endAt } } (run= limits the flags to that run's span).
 */
export async function GET(req: Request) {
  const who = await guardApi(req, "flags.read");
  if (who instanceof NextResponse) return who;
  const parsed = querySchema.safeParse(Object.fromEntries(new URL(req.url).searchParams));
  if (!parsed.success) return apiError(400, firstIssue(parsed.error).error, { field: firstIssue(parsed.error).field });
  const q = parsed.data;
  let fromMs = q.from?.getTime();
  let toMs = q.to?.getTime();
  let run = null;
  if (q.run !== undefined) {
    run = await runForTimeline(q.run);
    if (!run) return apiError(404, `run: no run numbered ${q.run}`, { field: "run" });
    fromMs = run.startAt.getTime();
    toMs = run.endAt?.getTime() ?? Date.now();
  }
  const flags = await listFlags({ states: q.state, subsystem: q.subsystem, fromMs, toMs, limit: q.limit });
  return NextResponse.json(run ? { flags, run } : { flags });
}

/** POST /api/flags { startAt, endAt (ISO with zone), subsystem, verdict: exclude|caution, reason } → 201 { flag } (state "proposed"). */
export async function POST(req: Request) {
  const who = await guardApi(req, "flags.manage");
  if (who instanceof NextResponse) return who;
  const actorId = userOnly(who);
  if (actorId instanceof NextResponse) return actorId;
  const body = await readBody(req, flagProposalSchema);
  if (body instanceof NextResponse) return body;
  try {
    return NextResponse.json({ flag: await proposeFlag(actorId, body) }, { status: 201 });
  } catch (err) {
    return knownError(err);
  }
}
