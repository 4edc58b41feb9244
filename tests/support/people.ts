/** Test people: made directly in the test database with unique e-mails, so tests never depend on each other. */
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { userRoles, users, type Role } from "@/db/schema";
import { hashPassword } from "@/lib/auth/secrets";

export type TestPerson = { id: number; email: string; password: string; name: string };

/** Create an active user holding the given roles. */
export async function makePerson(roles: Role[], label = "tester"): Promise<TestPerson> {
  const email = `${label}-${randomUUID().slice(0, 8)}@test.kestrin-deep.example`;
  const password = `pw-${randomUUID()}`;
  const name = `${label} ${email.slice(label.length + 1, label.length + 5)}`;
  const [res] = await db.insert(users).values({ email, displayName: name, passwordHash: await hashPassword(password) });
  if (roles.length) await db.insert(userRoles).values(roles.map((role) => ({ userId: res.insertId, role })));
  return { id: res.insertId, email, password, name };
}
