/** Seeds the demo people and their roles; an existing account is left as it is. */
import { eq } from "drizzle-orm";
import type { Database } from "../client";
import { userRoles, users } from "../schema";
import { hashPassword } from "../../lib/auth/secrets";
import { DEMO_PEOPLE } from "./people";

/** Insert missing demo users; returns the id of every demo user by e-mail. */
export async function seedPeople(db: Database): Promise<Map<string, number>> {
  const ids = new Map<string, number>();
  for (const p of DEMO_PEOPLE) {
    const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, p.email)).limit(1);
    if (existing) {
      ids.set(p.email, existing.id);
      continue;
    }
    const [res] = await db.insert(users).values({ email: p.email, displayName: p.displayName, passwordHash: await hashPassword(p.password) });
    await db.insert(userRoles).values(p.roles.map((role) => ({ userId: res.insertId, role })));
    ids.set(p.email, res.insertId);
  }
  return ids;
}
