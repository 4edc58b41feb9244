/**
 * Bad-time flags and subsystems: propose, confirm (two-person rule, enforced here inside the transaction),
 * withdraw, with every step in flag_events and the audit trail.
 */
import { and, asc, desc, eq, gt, inArray, lt, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "./client";
import { audit } from "./audit";
import { badTimeFlags, flagEvents, subsystems, users, type FlagState, type FlagVerdict } from "./schema";
import { assertFlagStep } from "@/components/quality/flag-rules";
import type { FlagProposal } from "@/components/quality/inputs";

/** A request about flags or subsystems that cannot be carried out (unknown record, inactive subsystem…). */
export class FlagRequestError extends Error {
  constructor(
    readonly code: "not_found" | "subsystem_unknown" | "subsystem_inactive" | "subsystem_exists",
    readonly status: 400 | 404 | 409,
    readonly field: string,
    reason: string,
  ) {
    super(reason);
    this.name = "FlagRequestError";
  }
}

export type PersonRef = { id: number; name: string };

/** A flag as pages and the API show it. */
export type FlagView = {
  id: number;
  startAt: Date;
  endAt: Date;
  subsystem: string;
  subsystemLabel: string;
  verdict: FlagVerdict;
  reason: string;
  state: FlagState;
  proposedBy: PersonRef;
  proposedAt: Date;
  confirmedBy: PersonRef | null;
  confirmedAt: Date | null;
  withdrawnBy: PersonRef | null;
  withdrawnAt: Date | null;
  withdrawReason: string | null;
};

export type FlagEventView = { id: number; action: string; actor: PersonRef; comment: string | null; at: Date };

export type SubsystemRow = typeof subsystems.$inferSelect;

/** Subsystems by label; inactive ones only when asked (a flag form offers active ones). */
export async function listSubsystems(includeInactive = false): Promise<SubsystemRow[]> {
  const q = db.select().from(subsystems);
  const rows = await (includeInactive ? q : q.where(eq(subsystems.active, true))).orderBy(asc(subsystems.label));
  return rows;
}

/** Add a subsystem; audited. */
export async function createSubsystem(actorId: number, input: { code: string; label: string }): Promise<SubsystemRow> {
  return db.transaction(async (tx) => {
    const [existing] = await tx.select().from(subsystems).where(eq(subsystems.code, input.code)).limit(1);
    if (existing) throw new FlagRequestError("subsystem_exists", 409, "code", `a subsystem with the code "${input.code}" already exists`);
    await tx.insert(subsystems).values({ code: input.code, label: input.label, active: true });
    await audit({ userId: actorId }, "subsystem.create", { type: "subsystem", id: input.code }, { label: input.label }, tx);
    return { code: input.code, label: input.label, active: true };
  });
}

/** Activate or deactivate a subsystem (flags already naming it stay as they are); audited. */
export async function setSubsystemActive(actorId: number, code: string, active: boolean): Promise<SubsystemRow> {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(subsystems).where(eq(subsystems.code, code)).limit(1);
    if (!row) throw new FlagRequestError("subsystem_unknown", 404, "code", `no subsystem with the code "${code}"`);
    await tx.update(subsystems).set({ active }).where(eq(subsystems.code, code));
    await audit({ userId: actorId }, active ? "subsystem.activate" : "subsystem.deactivate", { type: "subsystem", id: code }, undefined, tx);
    return { ...row, active };
  });
}

const proposer = alias(users, "proposer");
const confirmer = alias(users, "confirmer");
const withdrawer = alias(users, "withdrawer");

function flagQuery() {
  return db
    .select({
      flag: badTimeFlags,
      subsystemLabel: subsystems.label,
      proposerName: proposer.displayName,
      confirmerName: confirmer.displayName,
      withdrawerName: withdrawer.displayName,
    })
    .from(badTimeFlags)
    .innerJoin(subsystems, eq(subsystems.code, badTimeFlags.subsystem))
    .innerJoin(proposer, eq(proposer.id, badTimeFlags.proposedBy))
    .leftJoin(confirmer, eq(confirmer.id, badTimeFlags.confirmedBy))
    .leftJoin(withdrawer, eq(withdrawer.id, badTimeFlags.withdrawnBy))
    .$dynamic();
}

type FlagQueryRow = Awaited<ReturnType<ReturnType<typeof flagQuery>["execute"]>>[number];

function person(id: number | null, name: string | null): PersonRef | null {
  return id === null ? null : { id, name: name ?? `user ${id}` };
}

function toView(r: FlagQueryRow): FlagView {
  const f = r.flag;
  return {
    id: f.id,
    startAt: f.startAt,
    endAt: f.endAt,
    subsystem: f.subsystem,
    subsystemLabel: r.subsystemLabel,
    verdict: f.verdict,
    reason: f.reason,
    state: f.state,
    proposedBy: { id: f.proposedBy, name: r.proposerName },
    proposedAt: f.proposedAt,
    confirmedBy: person(f.confirmedBy, r.confirmerName),
    confirmedAt: f.confirmedAt,
    withdrawnBy: person(f.withdrawnBy, r.withdrawerName),
    withdrawnAt: f.withdrawnAt,
    withdrawReason: f.withdrawReason,
  };
}

export type FlagFilter = { states?: FlagState[]; subsystem?: string; fromMs?: number; toMs?: number; limit?: number };

/** Flags matching the filter (overlapping [fromMs, toMs) when given), newest start first. */
export async function listFlags(filter: FlagFilter = {}): Promise<FlagView[]> {
  const where: SQL[] = [];
  if (filter.states && filter.states.length > 0) where.push(inArray(badTimeFlags.state, filter.states));
  if (filter.subsystem) where.push(eq(badTimeFlags.subsystem, filter.subsystem));
  if (filter.toMs !== undefined) where.push(lt(badTimeFlags.startAt, new Date(filter.toMs)));
  if (filter.fromMs !== undefined) where.push(gt(badTimeFlags.endAt, new Date(filter.fromMs)));
  const rows = await flagQuery()
    .where(and(...where))
    .orderBy(desc(badTimeFlags.startAt), desc(badTimeFlags.id))
    .limit(Math.min(filter.limit ?? 500, 5000));
  return rows.map(toView);
}

/** One flag, or null. */
export async function getFlag(id: number): Promise<FlagView | null> {
  const [row] = await flagQuery().where(eq(badTimeFlags.id, id)).limit(1);
  return row ? toView(row) : null;
}

/** A flag's history, oldest first. */
export async function flagHistory(id: number): Promise<FlagEventView[]> {
  const rows = await db
    .select({ e: flagEvents, name: users.displayName })
    .from(flagEvents)
    .innerJoin(users, eq(users.id, flagEvents.actorId))
    .where(eq(flagEvents.flagId, id))
    .orderBy(asc(flagEvents.at), asc(flagEvents.id));
  return rows.map(({ e, name }) => ({ id: e.id, action: e.action, actor: { id: e.actorId, name }, comment: e.comment, at: e.at }));
}

/** Propose a flag (state "proposed"); the subsystem must exist and be active; audited. */
export async function proposeFlag(actorId: number, input: FlagProposal): Promise<FlagView> {
  const id = await db.transaction(async (tx) => {
    const [sub] = await tx.select().from(subsystems).where(eq(subsystems.code, input.subsystem)).limit(1);
    if (!sub) throw new FlagRequestError("subsystem_unknown", 400, "subsystem", `no subsystem with the code "${input.subsystem}"`);
    if (!sub.active) throw new FlagRequestError("subsystem_inactive", 400, "subsystem", `the subsystem "${sub.label}" is deactivated`);
    const [res] = await tx.insert(badTimeFlags).values({ ...input, state: "proposed", proposedBy: actorId });
    const flagId = res.insertId;
    await tx.insert(flagEvents).values({ flagId, action: "proposed", actorId, comment: input.reason });
    await audit(
      { userId: actorId },
      "flag.propose",
      { type: "flag", id: flagId },
      { startAt: input.startAt.toISOString(), endAt: input.endAt.toISOString(), subsystem: input.subsystem, verdict: input.verdict },
      tx,
    );
    return flagId;
  });
  return (await getFlag(id))!;
}

async function lockedFlag(tx: Parameters<Parameters<typeof db.transaction>[0]>[0], id: number) {
  const [row] = await tx.select().from(badTimeFlags).where(eq(badTimeFlags.id, id)).for("update").limit(1);
  if (!row) throw new FlagRequestError("not_found", 404, "id", `no flag with id ${id}`);
  return row;
}

/** Confirm a proposed flag; refused (FlagStepError) for the proposer or a flag no longer proposed; audited. */
export async function confirmFlag(actorId: number, id: number, comment?: string): Promise<FlagView> {
  await db.transaction(async (tx) => {
    // The row lock makes two simultaneous confirmations (or confirm + withdraw) take turns.
    const flag = await lockedFlag(tx, id);
    assertFlagStep("confirm", flag, actorId);
    await tx.update(badTimeFlags).set({ state: "confirmed", confirmedBy: actorId, confirmedAt: new Date() }).where(eq(badTimeFlags.id, id));
    await tx.insert(flagEvents).values({ flagId: id, action: "confirmed", actorId, comment: comment || null });
    await audit({ userId: actorId }, "flag.confirm", { type: "flag", id }, { proposedBy: flag.proposedBy, comment: comment || null }, tx);
  });
  return (await getFlag(id))!;
}

/** Withdraw a proposed or confirmed flag with a reason; audited. */
export async function withdrawFlag(actorId: number, id: number, reason: string): Promise<FlagView> {
  await db.transaction(async (tx) => {
    const flag = await lockedFlag(tx, id);
    assertFlagStep("withdraw", flag, actorId);
    await tx
      .update(badTimeFlags)
      .set({ state: "withdrawn", withdrawnBy: actorId, withdrawnAt: new Date(), withdrawReason: reason })
      .where(eq(badTimeFlags.id, id));
    await tx.insert(flagEvents).values({ flagId: id, action: "withdrawn", actorId, comment: reason });
    await audit({ userId: actorId }, "flag.withdraw", { type: "flag", id }, { fromState: flag.state, reason }, tx);
  });
  return (await getFlag(id))!;
}
