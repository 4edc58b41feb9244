import { describe, it, expect, vi, beforeEach, afterEach } from "vitest";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { runExposureCommand } from "@/lib/cli/exposure-command";

// Invented Quillon ledger (950 kg fiducial): the worked example run, an open run and a calibration run.
const ledger = {
  runs: [
    { number: 1, type: "science", start: "2031-03-01T00:00:00.000Z", end: "2031-03-01T10:00:00.000Z", liveSeconds: 32400, targetMassKg: 950 },
    { number: 2, type: "science", start: "2031-03-01T12:00:00.000Z", end: null, liveSeconds: 0, targetMassKg: 950 },
    { number: 3, type: "calibration", start: "2031-03-01T10:30:00.000Z", end: "2031-03-01T11:30:00.000Z", liveSeconds: 3000, targetMassKg: 950 },
  ],
  flags: [{ start: "2031-03-01T04:00:00.000Z", end: "2031-03-01T05:00:00.000Z", verdict: "exclude", subsystem: "daq" }],
  periods: [
    { name: "first", start: "2031-03-01T00:00:00.000Z", end: "2031-03-02T00:00:00.000Z", runTypes: ["science"] },
    { name: "calib", start: "2031-03-01T00:00:00+01:00", end: "2031-03-02T00:00:00.000Z", runTypes: ["calibration"] },
  ],
};

let dir: string;
let stdout: string;
let stderr: string;

beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), "deepshift-exposure-"));
  stdout = "";
  stderr = "";
  vi.spyOn(process.stdout, "write").mockImplementation((chunk: string | Uint8Array) => ((stdout += String(chunk)), true));
  vi.spyOn(process.stderr, "write").mockImplementation((chunk: string | Uint8Array) => ((stderr += String(chunk)), true));
});

afterEach(() => {
  vi.restoreAllMocks();
  rmSync(dir, { recursive: true, force: true });
});

function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

describe("deepshift exposure: valid ledger", () => {
  it("prints one JSON line with the period totals", async () => {
    const code = await runExposureCommand(["--input", file("ledger.json", JSON.stringify(ledger))]);
    expect(code).toBe(0);
    expect(stderr).toBe("");
    expect(stdout.trim().split("\n")).toHaveLength(1);
    const out = JSON.parse(stdout) as { periods: Array<Record<string, number | string>> };
    const [first, calib] = out.periods;
    // by hand (worked example): good live 32400 × 9/10 = 29160 s; 29160 / 86400 × 950 = 320.625 kg·day
    expect(first).toMatchObject({ name: "first", runs: 1, openRuns: 1 });
    expect(first!.liveSeconds).toBeCloseTo(32_400, 9);
    expect(first!.goodLiveSeconds).toBeCloseTo(29_160, 9);
    expect(first!.lostLiveSeconds).toBeCloseTo(3_240, 9);
    expect(first!.exposureKgDay).toBeCloseTo(320.625, 9);
    expect(first!.exposureTonneYear).toBeCloseTo(320.625 / 365_250, 15); // Julian year (IAU convention)
    // by hand: calibration run 3000 s live, no flags → 3000 / 86400 × 950 = 32.98611…; "+01:00" start is 23:00Z of 28 Feb
    expect(calib).toMatchObject({ name: "calib", runs: 1, openRuns: 0 });
    expect(calib!.exposureKgDay).toBeCloseTo((3_000 / 86_400) * 950, 9);
  });

  it("reads the ledger from stdin with --input -", async () => {
    const code = await runExposureCommand(["--input", "-"], { readStdin: async () => JSON.stringify(ledger) });
    expect(code).toBe(0);
    const out = JSON.parse(stdout) as { periods: Array<{ exposureKgDay: number }> };
    expect(out.periods[0]!.exposureKgDay).toBeCloseTo(320.625, 9); // by hand, as above
  });

  it("accepts --input=PATH and a ledger without flags", async () => {
    const { flags: _flags, ...noFlags } = ledger;
    const code = await runExposureCommand([`--input=${file("noflags.json", JSON.stringify(noFlags))}`]);
    expect(code).toBe(0);
    const out = JSON.parse(stdout) as { periods: Array<{ exposureKgDay: number }> };
    expect(out.periods[0]!.exposureKgDay).toBeCloseTo(356.25, 9); // by hand: 32400 / 86400 × 950
  });
});

const withRun = (patch: Record<string, unknown>) => JSON.stringify({ ...ledger, runs: [{ ...ledger.runs[0], ...patch }] });

describe("deepshift exposure: bad input", () => {
  it.each([
    { label: "missing --input", args: () => [], code: 2, message: "--input" },
    { label: "unknown option", args: () => ["--inptu", "x.json"], code: 2, message: "--inptu" },
    { label: "missing file", args: () => ["--input", join(dir, "nope.json")], code: 2, message: "nope.json: cannot read ledger" },
    { label: "bad JSON", args: () => ["--input", file("bad.json", "{runs:")], code: 2, message: "not valid JSON" },
    { label: "schema: missing liveSeconds", args: () => ["--input", file("s1.json", withRun({ liveSeconds: undefined }))], code: 2, message: "runs[0].liveSeconds" },
    { label: "schema: time without zone", args: () => ["--input", file("s2.json", withRun({ start: "2031-03-01 00:00" }))], code: 2, message: "runs[0].start" },
    { label: "schema: unknown run type", args: () => ["--input", file("s3.json", withRun({ type: "physics" }))], code: 2, message: "runs[0].type" },
    {
      label: "schema: bad flag verdict",
      args: () => ["--input", file("s4.json", JSON.stringify({ ...ledger, flags: [{ ...ledger.flags[0], verdict: "maybe" }] }))],
      code: 2,
      message: "flags[0].verdict",
    },
    { label: "schema: no periods", args: () => ["--input", file("s5.json", JSON.stringify({ ...ledger, periods: [] }))], code: 2, message: "periods" },
    // 10 h run = 36000 s, so 40000 s live is impossible → ExposureInputError from lib/exposure
    { label: "live time above duration", args: () => ["--input", file("e1.json", withRun({ liveSeconds: 40_000 }))], code: 2, message: "run 1: liveSeconds" },
    {
      label: "flag ending before it starts",
      args: () => ["--input", file("e2.json", JSON.stringify({ ...ledger, flags: [{ ...ledger.flags[0], id: 7, end: "2031-03-01T03:00:00.000Z" }] }))],
      code: 2,
      message: "flag 7: endMs",
    },
    {
      label: "period ending at its start",
      args: () => ["--input", file("e3.json", JSON.stringify({ ...ledger, periods: [{ ...ledger.periods[0], end: ledger.periods[0]!.start }] }))],
      code: 2,
      message: "period first: endMs",
    },
  ])("$label → exit $code", async ({ args, code, message }) => {
    expect(await runExposureCommand(args())).toBe(code);
    expect(stdout).toBe("");
    expect(stderr).toContain(message);
    expect(stderr.trim().split("\n")).toHaveLength(1); // one-line message
  });

  it("unexpected failure exits 1", async () => {
    const code = await runExposureCommand(["--input", "-"], { readStdin: () => Promise.reject(new Error("pipe broke")) });
    expect(code).toBe(1);
    expect(stderr).toContain("unexpected error: pipe broke");
  });
});
