/** Machine tokens for the DAQ: created by admins (shown once), stored hashed, revocable. */
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "./client";
import { audit, type Actor } from "./audit";
import { machineTokens } from "./schema";

/** The unrevoked token with that hash, or null; notes when it was last used. */
export async function findActiveToken(tokenHash: string) {
  const [row] = await db
    .select()
    .from(machineTokens)
    .where(and(eq(machineTokens.tokenHash, tokenHash), isNull(machineTokens.revokedAt)))
    .limit(1);
  if (!row) return null;
  await db.update(machineTokens).set({ lastUsedAt: new Date() }).where(eq(machineTokens.id, row.id));
  return row;
}

/** Every token, newest first (hashes left out). */
export async function listTokens() {
  return db
    .select({
      id: machineTokens.id,
      name: machineTokens.name,
      scopes: machineTokens.scopes,
      createdAt: machineTokens.createdAt,
      lastUsedAt: machineTokens.lastUsedAt,
      revokedAt: machineTokens.revokedAt,
    })
    .from(machineTokens)
    .orderBy(desc(machineTokens.id));
}

/** Store a new token's hash; audited. */
export async function createToken(actor: Actor, name: string, scopes: string[], tokenHash: string): Promise<number> {
  return db.transaction(async (tx) => {
    const [res] = await tx.insert(machineTokens).values({ name, scopes, tokenHash, createdBy: actor.userId ?? null });
    await audit(actor, "token.create", { type: "machine_token", id: res.insertId }, { name, scopes }, tx);
    return res.insertId;
  });
}

/** Revoke a token; audited. */
export async function revokeToken(actor: Actor, id: number): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.update(machineTokens).set({ revokedAt: new Date() }).where(and(eq(machineTokens.id, id), isNull(machineTokens.revokedAt)));
    await audit(actor, "token.revoke", { type: "machine_token", id }, undefined, tx);
  });
}
