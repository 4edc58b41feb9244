/**
 * Reading runs: the keyset-paged list with filters, one run with its linked entries, and each run's
 * data-quality status against the confirmed excluding flags. Opening and closing live in run-writes.ts.
 */
import { and, count, desc, eq, gt, gte, lt, max, or, type SQL } from "drizzle-orm";
import { db } from "./client";
import { badTimeFlags, runs } from "./schema";
import { selectRuns, toRunView, type RunListRow, type RunView } from "./run-views";
import { linkedEntries, type LinkedEntry } from "./run-entries";
import { encodeCursor, type RunListQuery } from "../lib/runs";
import { runQualities, type ExposureFlag, type RunQuality } from "../lib/exposure";

/** One run with its conditions, data-quality status and linked logbook entries. */
export type RunDetail = RunView & { quality: RunQuality; entries: LinkedEntry[] };

/** A page of the runs list, newest first. */
export interface RunPage {
  runs: RunListRow[];
  /** Pass as `cursor` for the next (older) page; null on the last page. */
  nextCursor: string | null;
  /** How many runs are open right now (any page, any filter), so a list knows to keep refreshing. */
  openRuns: number;
}

/** Confirmed flags with verdict "exclude" overlapping [fromMs, toMs): the only ones that remove run time. */
export async function confirmedExcludingFlags(fromMs: number, toMs: number): Promise<ExposureFlag[]> {
  const rows = await db
    .select({ id: badTimeFlags.id, startAt: badTimeFlags.startAt, endAt: badTimeFlags.endAt, subsystem: badTimeFlags.subsystem })
    .from(badTimeFlags)
    .where(
      and(
        eq(badTimeFlags.state, "confirmed"),
        eq(badTimeFlags.verdict, "exclude"),
        lt(badTimeFlags.startAt, new Date(toMs)),
        gt(badTimeFlags.endAt, new Date(fromMs)),
      ),
    );
  return rows.map((f) => ({ id: f.id, startMs: f.startAt.getTime(), endMs: f.endAt.getTime(), verdict: "exclude" as const, subsystem: f.subsystem }));
}

/** Data-quality status of each run (input order), reading the flags over the runs' whole span once. */
export async function qualitiesOf(views: readonly RunView[]): Promise<RunQuality[]> {
  const closed = views.filter((v) => v.endMs !== null);
  if (closed.length === 0) return views.map(() => "open");
  const fromMs = Math.min(...closed.map((v) => v.startMs));
  const toMs = Math.max(...closed.map((v) => v.endMs ?? v.startMs));
  const flags = await confirmedExcludingFlags(fromMs, toMs);
  return runQualities(
    views.map((v) => ({
      id: v.id,
      number: v.number,
      type: v.type,
      startMs: v.startMs,
      endMs: v.endMs,
      liveSeconds: v.liveSeconds ?? 0,
      targetMassKg: Number(v.targetMassKg),
    })),
    flags,
  );
}

/** How many runs are open now. */
export async function countOpenRuns(): Promise<number> {
  const [row] = await db.select({ n: count() }).from(runs).where(eq(runs.status, "running"));
  return row?.n ?? 0;
}

/** The runs list: filters (type, status, start in [from, to)), newest first by (start, id), keyset-paged. */
export async function listRuns(q: RunListQuery): Promise<RunPage> {
  const where: (SQL | undefined)[] = [
    q.type ? eq(runs.type, q.type) : undefined,
    q.status ? eq(runs.status, q.status) : undefined,
    q.fromMs !== null ? gte(runs.startAt, new Date(q.fromMs)) : undefined,
    q.toMs !== null ? lt(runs.startAt, new Date(q.toMs)) : undefined,
    q.cursor
      ? or(lt(runs.startAt, new Date(q.cursor.startMs)), and(eq(runs.startAt, new Date(q.cursor.startMs)), lt(runs.id, q.cursor.id)))
      : undefined,
  ];
  const rows = await selectRuns()
    .where(and(...where))
    .orderBy(desc(runs.startAt), desc(runs.id))
    .limit(q.limit + 1);
  const page = rows.slice(0, q.limit).map(toRunView);
  const last = page[page.length - 1];
  const qualities = await qualitiesOf(page);
  return {
    runs: page.map(({ conditions: _c, ...v }, i) => ({ ...v, quality: qualities[i] ?? "open" })),
    nextCursor: rows.length > q.limit && last ? encodeCursor({ startMs: last.startMs, id: last.id }) : null,
    openRuns: await countOpenRuns(),
  };
}

/** One run by number, or null. */
export async function getRunView(number: number): Promise<RunView | null> {
  const [row] = await selectRuns().where(eq(runs.number, number)).limit(1);
  return row ? toRunView(row) : null;
}

/** One run by number with its quality and linked entries, or null. */
export async function getRunDetail(number: number): Promise<RunDetail | null> {
  const view = await getRunView(number);
  if (!view) return null;
  const [quality = "open"] = await qualitiesOf([view]);
  return { ...view, quality, entries: await linkedEntries(number) };
}

/** A run number to suggest in the open form: one after the latest-started run, or after the highest if that is taken. */
export async function suggestNextRunNumber(): Promise<number> {
  const [latest] = await db.select({ n: runs.number }).from(runs).orderBy(desc(runs.startAt), desc(runs.id)).limit(1);
  if (!latest) return 1;
  const [taken] = await db.select({ id: runs.id }).from(runs).where(eq(runs.number, latest.n + 1)).limit(1);
  if (!taken) return latest.n + 1;
  const [top] = await db.select({ n: max(runs.number) }).from(runs);
  return (top?.n ?? latest.n) + 1;
}
