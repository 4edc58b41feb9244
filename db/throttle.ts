/** Sign-in throttling kept in the database, so that every app node behind a load balancer sees the same counts. */
import { and, count, eq, gte, inArray, lt } from "drizzle-orm";
import { db } from "./client";
import { signInFailures } from "./schema";

/** How many failures each key has within the window ending now. */
export async function failuresSince(keys: string[], since: Date): Promise<Map<string, number>> {
  const rows = await db
    .select({ key: signInFailures.key, n: count() })
    .from(signInFailures)
    .where(and(inArray(signInFailures.key, keys), gte(signInFailures.at, since)))
    .groupBy(signInFailures.key);
  return new Map(rows.map((r) => [r.key, r.n]));
}

/** Record one failure under each key, and prune rows older than the window. */
export async function recordFailure(keys: string[], at: Date, pruneBefore: Date): Promise<void> {
  await db.insert(signInFailures).values(keys.map((key) => ({ key, at })));
  await db.delete(signInFailures).where(lt(signInFailures.at, pruneBefore));
}

/** Forget an account's failures after a successful sign-in. */
export async function clearFailures(key: string): Promise<void> {
  await db.delete(signInFailures).where(eq(signInFailures.key, key));
}
