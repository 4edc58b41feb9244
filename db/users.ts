/** People and roles: look-ups for sign-in and the admin pages, and the changes admins make. */
import { and, asc, eq, gt, isNull } from "drizzle-orm";
import { db } from "./client";
import { audit, type Actor } from "./audit";
import { invitations, ROLES, userRoles, users, type Role } from "./schema";

export type UserWithRoles = { id: number; email: string; displayName: string; active: boolean; roles: Role[]; hasPassword: boolean };

function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** The user with that e-mail (case-insensitive) and their password hash, or null. */
export async function findUserForSignIn(email: string) {
  const [row] = await db.select().from(users).where(eq(users.email, normaliseEmail(email))).limit(1);
  return row ?? null;
}

/** The roles a user holds, in the table's order. */
export async function rolesOf(userId: number): Promise<Role[]> {
  const rows = await db.select({ role: userRoles.role }).from(userRoles).where(eq(userRoles.userId, userId));
  const held = new Set(rows.map((r) => r.role));
  return ROLES.filter((r) => held.has(r));
}

/** A user's current standing: active and roles, re-read for sessions every few minutes. */
export async function standingOf(userId: number): Promise<{ active: boolean; roles: Role[] } | null> {
  const [row] = await db.select({ active: users.active }).from(users).where(eq(users.id, userId)).limit(1);
  if (!row) return null;
  return { active: row.active, roles: await rolesOf(userId) };
}

/** Every user with their roles, by display name. */
export async function listUsers(): Promise<UserWithRoles[]> {
  const rows = await db.select().from(users).orderBy(asc(users.displayName));
  const roleRows = await db.select().from(userRoles);
  return rows.map((u) => ({
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    active: u.active,
    hasPassword: u.passwordHash !== null,
    roles: ROLES.filter((r) => roleRows.some((rr) => rr.userId === u.id && rr.role === r)),
  }));
}

/** E-mail addresses of active users holding a role (for notifications). */
export async function emailsWithRole(role: Role): Promise<string[]> {
  const rows = await db
    .select({ email: users.email })
    .from(users)
    .innerJoin(userRoles, eq(userRoles.userId, users.id))
    .where(and(eq(userRoles.role, role), eq(users.active, true)));
  return rows.map((r) => r.email);
}

export class UserExistsError extends Error {
  constructor(email: string) {
    super(`someone with the address ${email} already has an account`);
  }
}

/** Create a user (no password yet) with roles and an invitation token hash; audited. */
export async function createInvitedUser(
  actor: Actor,
  input: { email: string; displayName: string; roles: Role[]; tokenHash: string; expiresAt: Date },
): Promise<number> {
  const email = normaliseEmail(input.email);
  return db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
    if (existing) throw new UserExistsError(email);
    const [res] = await tx.insert(users).values({ email, displayName: input.displayName.trim(), active: true });
    const userId = res.insertId;
    if (input.roles.length) await tx.insert(userRoles).values(input.roles.map((role) => ({ userId, role })));
    await tx.insert(invitations).values({ userId, tokenHash: input.tokenHash, invitedBy: actor.userId ?? null, expiresAt: input.expiresAt });
    await audit(actor, "user.invite", { type: "user", id: userId }, { email, roles: input.roles }, tx);
    return userId;
  });
}

/** The open (unused, unexpired) invitation for a token hash, with its user. */
export async function findOpenInvitation(tokenHash: string, now = new Date()) {
  const [row] = await db
    .select({ invitationId: invitations.id, userId: users.id, email: users.email, displayName: users.displayName })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.userId))
    .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.usedAt), gt(invitations.expiresAt, now)))
    .limit(1);
  return row ?? null;
}

/** Use an invitation: set the password hash and mark the token spent, atomically; audited. */
export async function acceptInvitation(invitationId: number, userId: number, passwordHash: string): Promise<boolean> {
  return db.transaction(async (tx) => {
    const res = await tx
      .update(invitations)
      .set({ usedAt: new Date() })
      .where(and(eq(invitations.id, invitationId), isNull(invitations.usedAt)));
    if (res[0].affectedRows !== 1) return false;
    await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
    await audit({ userId }, "user.set_password", { type: "user", id: userId }, { via: "invitation" }, tx);
    return true;
  });
}

/** Grant or remove one role; audited. */
export async function setRole(actor: Actor, userId: number, role: Role, held: boolean): Promise<void> {
  await db.transaction(async (tx) => {
    if (held) await tx.insert(userRoles).ignore().values({ userId, role });
    else await tx.delete(userRoles).where(and(eq(userRoles.userId, userId), eq(userRoles.role, role)));
    await audit(actor, held ? "user.role_grant" : "user.role_remove", { type: "user", id: userId }, { role }, tx);
  });
}

/** Activate or deactivate a user; audited. */
export async function setActive(actor: Actor, userId: number, active: boolean): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.update(users).set({ active }).where(eq(users.id, userId));
    await audit(actor, active ? "user.activate" : "user.deactivate", { type: "user", id: userId }, undefined, tx);
  });
}
