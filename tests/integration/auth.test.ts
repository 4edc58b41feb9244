import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, invitations, userRoles, users } from "@/db/schema";
import { acceptInvitation, createInvitedUser, findOpenInvitation, setActive, setRole, standingOf, UserExistsError } from "@/db/users";
import { newToken } from "@/lib/auth/secrets";
import { THROTTLED_MESSAGE } from "@/lib/auth/throttle";
import { makePerson } from "../support/people";
import { APP_URL, signIn } from "../support/http";

afterAll(closeDb);

async function auditFor(userId: number) {
  return db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "user"), eq(auditEvents.recordId, String(userId))));
}

describe("users, roles and the audit trail (database)", () => {
  it("an invitation creates the user, the roles, a hashed token and an audit row", async () => {
    const admin = await makePerson(["admin"], "admin");
    const { token, hash } = newToken();
    const email = `Invitee-${Date.now()}@Test.Kestrin-Deep.example`;
    const id = await createInvitedUser(
      { userId: admin.id },
      { email, displayName: "Ada Invitee", roles: ["shift_crew", "safety_officer"], tokenHash: hash, expiresAt: new Date(Date.now() + 3600_000) },
    );
    const [row] = await db.select().from(users).where(eq(users.id, id));
    expect(row?.email).toBe(email.toLowerCase());
    expect(row?.passwordHash).toBeNull();
    expect((await standingOf(id))?.roles).toEqual(["shift_crew", "safety_officer"]);
    const [inv] = await db.select().from(invitations).where(eq(invitations.userId, id));
    expect(inv?.tokenHash).toBe(hash);
    expect(inv?.tokenHash).not.toContain(token);
    const trail = await auditFor(id);
    expect(trail.map((a) => a.action)).toContain("user.invite");
    expect(trail.find((a) => a.action === "user.invite")?.actorUserId).toBe(admin.id);

    await expect(
      createInvitedUser({ userId: admin.id }, { email, displayName: "Again", roles: ["admin"], tokenHash: newToken().hash, expiresAt: new Date() }),
    ).rejects.toBeInstanceOf(UserExistsError);

    const open = await findOpenInvitation(hash);
    expect(open?.userId).toBe(id);
    expect(await acceptInvitation(open!.invitationId, id, "$2b$11$fakehashfakehashfakehashfakehashfakehashfakehashfake")).toBe(true);
    // The link works once.
    expect(await findOpenInvitation(hash)).toBeNull();
    expect(await acceptInvitation(open!.invitationId, id, "$2b$11$other")).toBe(false);
  });

  it("an expired invitation is not found", async () => {
    const admin = await makePerson(["admin"], "admin");
    const { hash } = newToken();
    await createInvitedUser(
      { userId: admin.id },
      { email: `late-${Date.now()}@test.kestrin-deep.example`, displayName: "Late", roles: ["shift_crew"], tokenHash: hash, expiresAt: new Date(Date.now() - 1000) },
    );
    expect(await findOpenInvitation(hash)).toBeNull();
  });

  it("granting, removing and deactivating are audited and change the standing", async () => {
    const admin = await makePerson(["admin"], "admin");
    const person = await makePerson(["shift_crew"], "crew");
    await setRole({ userId: admin.id }, person.id, "detector_expert", true);
    await setRole({ userId: admin.id }, person.id, "detector_expert", true); // granting twice is harmless
    expect((await standingOf(person.id))?.roles).toEqual(["shift_crew", "detector_expert"]);
    await setRole({ userId: admin.id }, person.id, "shift_crew", false);
    expect((await standingOf(person.id))?.roles).toEqual(["detector_expert"]);
    await setActive({ userId: admin.id }, person.id, false);
    expect((await standingOf(person.id))?.active).toBe(false);
    const actions = (await auditFor(person.id)).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["user.role_grant", "user.role_remove", "user.deactivate"]));
    const rows = await db.select().from(userRoles).where(eq(userRoles.userId, person.id));
    expect(rows).toHaveLength(1);
  });
});

describe("guards over HTTP (running app)", () => {
  it("health reports the database, the object store and SMTP", async () => {
    const res = await fetch(`${APP_URL}/api/health`);
    const body = (await res.json()) as { ok: boolean; services: Record<string, { ok: boolean }> };
    expect(res.status).toBe(200);
    expect(Object.keys(body.services).sort()).toEqual(["database", "objectStore", "smtp"]);
    expect(body.ok).toBe(true);
  });

  it("an admin API answers 401 signed out, 403 to shift crew, 200 to an admin", async () => {
    expect((await fetch(`${APP_URL}/api/admin/users`)).status).toBe(401);
    const crew = await makePerson(["shift_crew"], "crew");
    const crewRes = await (await signIn(crew.email, crew.password)).fetch("/api/admin/users");
    expect(crewRes.status).toBe(403);
    expect(((await crewRes.json()) as { error: string }).error).toMatch(/not allowed/);
    const admin = await makePerson(["admin"], "admin");
    const adminRes = await (await signIn(admin.email, admin.password)).fetch("/api/admin/users");
    expect(adminRes.status).toBe(200);
    const list = (await adminRes.json()) as { users: { email: string }[] };
    expect(list.users.some((u) => u.email === crew.email)).toBe(true);
  });

  it("a deactivated account cannot sign in", async () => {
    const person = await makePerson(["shift_crew"], "gone");
    await setActive({ userId: person.id }, person.id, false);
    await expect(signIn(person.email, person.password)).rejects.toThrow(/do not match an active account/);
  });

  it("the sixth attempt after five wrong passwords is refused by the rate limit, even with the right one", async () => {
    const person = await makePerson(["shift_crew"], "typo");
    for (let i = 0; i < 5; i++) await expect(signIn(person.email, "wrong-password")).rejects.toThrow(/do not match/);
    await expect(signIn(person.email, person.password)).rejects.toThrow(THROTTLED_MESSAGE.slice(0, 30));
  });
});
