/**
 * POST /api/jobs: run the scheduled jobs once, now (tests and operators use it instead of waiting a minute).
 * Allowed for admins and safety officers (permission "jobs.run"), or with the header `x-jobs-secret` equal to
 * the JOBS_SECRET environment variable when that is set. Only a secret-bearing call may pass {"now": ISO} to run
 * the jobs as at another instant: a made-up clock would otherwise let anyone spend the day's digest early.
 */
import { timingSafeEqual } from "node:crypto";
import { NextResponse } from "next/server";
import { z } from "zod";
import { apiError, guardApi } from "@/lib/auth/guards";
import { runJobs } from "@/lib/server/jobs";
import { isoInstant } from "../sources/schemas";
import { parseOr400 } from "../safety/http";

export const dynamic = "force-dynamic";

function secretMatches(req: Request): boolean {
  const secret = process.env.JOBS_SECRET;
  const given = req.headers.get("x-jobs-secret");
  if (!secret || !given) return false;
  const a = Buffer.from(secret);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

const body = z.object({ now: isoInstant.optional() });

/** Run every job once → 200 {ranAt, report: {jobName: summary}}. */
export async function POST(req: Request) {
  const bySecret = secretMatches(req);
  if (!bySecret) {
    const who = await guardApi(req, "jobs.run");
    if (who instanceof NextResponse) return who;
  }
  const text = await req.text();
  let raw: unknown = {};
  if (text.trim()) {
    try {
      raw = JSON.parse(text);
    } catch {
      return apiError(400, "the body must be JSON", { field: "body" });
    }
  }
  const input = parseOr400(body, raw);
  if (input instanceof NextResponse) return input;
  if (input.now && !bySecret) return apiError(403, "only a call with the jobs secret may set now", { field: "now" });
  const now = input.now ?? new Date();
  return NextResponse.json({ ranAt: now.toISOString(), report: await runJobs(now) });
}
