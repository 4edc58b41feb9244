/**
 * Exposure benchmark: a period summary over 100 000 runs and 20 000 flags through the path the API takes
 * (db/exposure.ts load + lib/exposure compute) against only reading the same rows with the same SELECTs.
 * Prints both times and their ratio (target ≤ 1.5×).
 *
 * Where the rows go: a throwaway database ds_bench_<random> on the server of BENCH_ADMIN_URL (or DATABASE_URL),
 * migrated, filled, measured and dropped. If that server refuses CREATE DATABASE, the rows go into DATABASE_URL's
 * own database instead, marked (run numbers 50 000 000…, subsystem "bench", year 2041 on) and deleted at the end;
 * only then is the running app's HTTP API timed too (APP_URL), since only then does the app see the rows.
 *
 *   npm run bench:exposure                    (BENCH_RUNS, BENCH_FLAGS, BENCH_REPEATS to change the size)
 *   BENCH_IN_APP_DB=1 npm run bench:exposure  (marked rows in the app's own database; times APP_URL's API too)
 */
import { randomBytes } from "node:crypto";
import { fileURLToPath } from "node:url";
import { cpus, loadavg } from "node:os";
import mysql from "mysql2/promise";

const RUNS = Number(process.env.BENCH_RUNS ?? 100_000);
const FLAGS = Number(process.env.BENCH_FLAGS ?? 20_000);
const REPEATS = Number(process.env.BENCH_REPEATS ?? 7);
const FIRST_RUN = 50_000_000;
const T0 = Date.UTC(2041, 0, 1);
const H = 3_600_000;
const tag = randomBytes(4).toString("hex");

/** People made for the bench's HTTP timings (marked mode without demo people), removed or deactivated at the end. */
const benchPeople: number[] = [];

type Mode = { kind: "throwaway"; url: string; admin: string; name: string } | { kind: "marked"; url: string };

async function chooseMode(): Promise<Mode> {
  const appUrl = process.env.DATABASE_URL;
  if (!appUrl) throw new Error("DATABASE_URL is not set (source /tmp/devenv.sh or the start script first)");
  // BENCH_IN_APP_DB=1 puts the marked rows where the running app reads, so its HTTP API can be timed as well.
  if (process.env.BENCH_IN_APP_DB === "1") return { kind: "marked", url: appUrl };
  const admin = process.env.BENCH_ADMIN_URL ?? appUrl;
  const name = `ds_bench_${tag}`;
  const server = new URL(admin);
  server.pathname = "/";
  const conn = await mysql.createConnection({ uri: server.toString() });
  try {
    await conn.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    const url = new URL(admin);
    url.pathname = `/${name}`;
    return { kind: "throwaway", url: url.toString(), admin: server.toString(), name };
  } catch (err) {
    process.stdout.write(`CREATE DATABASE refused (${(err as Error).message}); using marked rows in DATABASE_URL's database\n`);
    return { kind: "marked", url: appUrl };
  } finally {
    await conn.end();
  }
}

const mode = await chooseMode();
// db/client opens its pool on first use, so pointing DATABASE_URL here makes every module use the bench rows.
process.env.DATABASE_URL = mode.url;
const { closeDb, db, pool } = await import("../../db/client");
const { migrate } = await import("drizzle-orm/mysql2/migrator");
const { loadExposureInputs, loadPeriodReport, loadPeriodSummary, loadPeriodsTotals, reportPeriodOf, selectFlagRows, selectRunRows } = await import("../../db/exposure");
const { computePeriodSummary } = await import("../../components/exposure/compute");
const { getPeriod } = await import("../../db/periods");

const sqlTime = (ms: number) => new Date(ms).toISOString().slice(0, 23).replace("T", " ");
let seed = 20_417;
const rnd = () => ((seed = (seed * 16_807) % 2_147_483_647) / 2_147_483_647);

async function insertBatches(sql: string, rows: unknown[][], size = 5000): Promise<void> {
  for (let i = 0; i < rows.length; i += size) await pool().query(sql, [rows.slice(i, i + size)]);
}

async function fill(): Promise<{ periodId: number; userId: number; configId: number }> {
  const p = pool();
  const [u] = await p.query(`INSERT INTO users (email, display_name) VALUES (?, ?)`, [`bench-${tag}@bench.kestrin-deep.example`, `bench ${tag}`]);
  const userId = (u as { insertId: number }).insertId;
  await p.query(`INSERT IGNORE INTO subsystems (code, label, active) VALUES ('bench', 'Benchmark', 1)`);
  const [c] = await p.query(
    `INSERT INTO detector_configs (detector, name, target_material, fiducial_mass_kg, effective_from) VALUES (?, ?, 'xenon', 950, ?)`,
    [`Quillon-bench-${tag}`, `bench ${tag}`, sqlTime(T0)],
  );
  const configId = (c as { insertId: number }).insertId;
  const runs: unknown[][] = [];
  for (let i = 0; i < RUNS; i++) {
    const start = T0 + i * H;
    const end = start + 55 * 60_000; // 55 min runs, 5 min gaps
    const live = 3300 * (0.95 + 0.04 * rnd());
    // Every hundredth run overrides the mass, as after a grid repair.
    runs.push([FIRST_RUN + i, i % 10 === 0 ? "calibration" : "science", "ended", sqlTime(start), sqlTime(end), live.toFixed(3), (3300 - live).toFixed(3), configId, i % 100 === 0 ? "948.5" : null, "{}"]);
  }
  await insertBatches(
    `INSERT INTO runs (number, type, status, start_at, end_at, live_seconds, dead_seconds, config_id, target_mass_override_kg, conditions) VALUES ?`,
    runs,
  );
  const flags: unknown[][] = [];
  for (let i = 0; i < FLAGS; i++) {
    const start = T0 + Math.floor(rnd() * RUNS * H);
    const end = start + Math.ceil(rnd() * 2 * H);
    const state = rnd() < 0.8 ? "confirmed" : "proposed";
    flags.push([sqlTime(start), sqlTime(end), "bench", rnd() < 0.8 ? "exclude" : "caution", "benchmark flag", state, userId, state === "confirmed" ? userId : null]);
  }
  await insertBatches(`INSERT INTO bad_time_flags (start_at, end_at, subsystem, verdict, reason, state, proposed_by, confirmed_by) VALUES ?`, flags);
  const [pr] = await p.query(
    `INSERT INTO dq_periods (name, start_at, end_at, run_types, signal_acceptance, blind) VALUES (?, ?, ?, '["science"]', 0.8, 0)`,
    [`bench ${tag}`, sqlTime(T0), sqlTime(T0 + RUNS * H)],
  );
  return { periodId: (pr as { insertId: number }).insertId, userId, configId };
}

async function cleanUp(ids: { periodId: number; userId: number; configId: number } | null): Promise<void> {
  if (mode.kind === "throwaway") {
    await closeDb();
    const conn = await mysql.createConnection({ uri: mode.admin });
    await conn.query(`DROP DATABASE IF EXISTS \`${mode.name}\``);
    await conn.end();
    return;
  }
  const p = pool();
  if (ids) {
    await p.query(`DELETE FROM bad_time_flags WHERE subsystem = 'bench' AND proposed_by = ?`, [ids.userId]);
    await p.query(`DELETE FROM runs WHERE number >= ? AND number < ? AND config_id = ?`, [FIRST_RUN, FIRST_RUN + RUNS, ids.configId]);
    await p.query(`DELETE FROM dq_periods WHERE id = ?`, [ids.periodId]);
    await p.query(`DELETE FROM detector_configs WHERE id = ?`, [ids.configId]);
    await p.query(`DELETE FROM users WHERE id = ?`, [ids.userId]);
  }
  // The signed-in bench convener may be named in the audit trail by the sign-in; then it stays (deactivated).
  for (const id of benchPeople) await p.query(`DELETE FROM users WHERE id = ?`, [id]).catch(() => p.query(`UPDATE users SET active = 0 WHERE id = ?`, [id]));
  const [left] = await p.query(`SELECT COUNT(*) AS n FROM bad_time_flags WHERE subsystem = 'bench'`);
  if ((left as { n: number }[])[0]?.n === 0) await p.query(`DELETE FROM subsystems WHERE code = 'bench'`);
  await closeDb();
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
async function timed(fn: () => Promise<unknown>): Promise<number> {
  const t = performance.now();
  await fn();
  return performance.now() - t;
}

/** The API's own timings, only when the running app sees the bench rows (marked mode) and answers. */
async function httpTimers(periodId: number): Promise<{ key: string; label: string; run: () => Promise<unknown> }[]> {
  const appUrl = process.env.APP_URL;
  if (mode.kind !== "marked" || !appUrl) return [];
  try {
    await fetch(`${appUrl}/api/health`, { signal: AbortSignal.timeout(2000) });
  } catch {
    return [];
  }
  const { makePerson } = await import("../support/people");
  const { signIn } = await import("../support/http");
  // The demo convener when the database has the demo people; else a person made for the bench.
  const session = await signIn("priya.castel@kestrin-deep.example", "quillon-convener").catch(async () => {
    const person = await makePerson(["analysis_convener"], "bench");
    benchPeople.push(person.id);
    return signIn(person.email, person.password);
  });
  const get = (path: string) => async () => {
    const res = await session.fetch(path);
    if (res.status !== 200) throw new Error(`HTTP ${res.status} for ${path}: ${(await res.text()).slice(0, 200)}`);
    await res.arrayBuffer();
  };
  return [
    { key: "http-summary", label: `HTTP GET /api/periods/${periodId}/exposure?runs=none (totals + preview)`, run: get(`/api/periods/${periodId}/exposure?format=json&runs=none`) },
    { key: "http-export", label: `HTTP GET /api/periods/${periodId}/exposure?format=json (every run)`, run: get(`/api/periods/${periodId}/exposure?format=json`) },
  ];
}

let ids: { periodId: number; userId: number; configId: number } | null = null;
try {
  if (mode.kind === "throwaway") await migrate(db, { migrationsFolder: fileURLToPath(new URL("../../db/migrations", import.meta.url)) });
  const t0 = performance.now();
  ids = await fill();
  process.stdout.write(`filled ${RUNS} runs and ${FLAGS} flags in ${((performance.now() - t0) / 1000).toFixed(1)} s (${mode.kind === "throwaway" ? `database ${mode.name}` : "marked rows"})\n`);
  const period = (await getPeriod(ids.periodId))!;
  const q = { startMs: period.startAt.getTime(), endMs: period.endAt.getTime(), runTypes: period.runTypes };
  const meta = reportPeriodOf(period);
  const paths: { key: string; label: string; run: () => Promise<unknown> }[] = [
    { key: "read", label: "read only: the same two SELECTs, no computing", run: () => Promise.all([selectRunRows(q), selectFlagRows(q)]) },
    { key: "summary", label: "period summary: db/exposure.ts load + lib/exposure, with the proposed-flags preview", run: () => loadPeriodSummary(period, { preview: true }) },
    { key: "totals", label: "period list totals: loadPeriodsTotals (GET /api/periods)", run: () => loadPeriodsTotals([period]) },
    { key: "export", label: "full JSON export: summary + per-run report + JSON.stringify", run: async () => JSON.stringify((await loadPeriodReport(period, { preview: true })).report) },
  ];
  const http = await httpTimers(ids.periodId);
  paths.push(...http);

  // Warm up (pool connections, JIT), then take turns so a load spike on the machine hits every path alike.
  for (const p of paths) await p.run();
  const times = new Map(paths.map((p) => [p.key, [] as number[]]));
  for (let k = 0; k < REPEATS; k++) for (const p of paths) times.get(p.key)!.push(await timed(p.run));

  // Where the summary's time goes: loading (SELECTs + conversion to lib shapes) and computing.
  const loads: number[] = [];
  const computes: number[] = [];
  for (let k = 0; k < 3; k++) {
    let inputs: Awaited<ReturnType<typeof loadExposureInputs>> | null = null;
    loads.push(await timed(async () => (inputs = await loadExposureInputs(q))));
    computes.push(await timed(async () => computePeriodSummary(meta, inputs!, { preview: true })));
  }
  const first = await loadPeriodSummary(period, { preview: true });
  const t = first.summary.totals;
  const read = median(times.get("read")!);
  const lines = [
    `machine load average ${loadavg().map((x) => x.toFixed(1)).join(" ")} on ${cpus().length} CPUs; wall-clock medians of ${REPEATS} turns`,
    `period: ${t.runs} science runs counted of ${RUNS}, ${first.preview?.proposedExcludingFlags ?? 0} proposed excluding flags in the preview`,
    `exposure ${t.exposureKgDay.toFixed(3)} kg·day (${t.exposureTonneYear.toFixed(5)} t·yr), ${(t.lostLiveSeconds / 3600).toFixed(1)} h of live time lost to flags`,
  ];
  for (const p of paths) {
    const xs = times.get(p.key)!;
    const m = median(xs);
    const ratio = p.key === "read" ? "" : `  → ${(m / read).toFixed(2)}× read`;
    lines.push(`${p.label}: ${m.toFixed(1)} ms [${xs.map((x) => x.toFixed(0)).join(", ")}]${ratio}`);
  }
  lines.push(`  summary parts: load (SELECTs + conversion) ${median(loads).toFixed(1)} ms, lib/exposure + preview ${median(computes).toFixed(1)} ms`);
  const ratio = median(times.get("summary")!) / read;
  lines.push(`RESULT period summary / read = ${ratio.toFixed(2)}× (target ≤ 1.5×): ${ratio <= 1.5 ? "OK" : "OVER TARGET"}`);
  if (http.length === 0) {
    lines.push(`HTTP API: not timed (${mode.kind === "throwaway" ? "the running app does not see the throwaway database" : "APP_URL not set or not reachable"})`);
  }
  process.stdout.write(lines.join("\n") + "\n");
} finally {
  await cleanUp(ids);
}
