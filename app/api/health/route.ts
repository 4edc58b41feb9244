import { NextResponse } from "next/server";
import { checkHealth } from "@/lib/server/health";

export const dynamic = "force-dynamic";

/** GET /api/health: database, object store and SMTP reachability (open without sign-in). */
export async function GET() {
  const health = await checkHealth();
  return NextResponse.json(health, { status: health.ok ? 200 : 503 });
}
