import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { runLimitsCommand } from "@/lib/cli/limits-command";

let out: string[];
let err: string[];

beforeEach(() => {
  out = [];
  err = [];
  vi.spyOn(process.stdout, "write").mockImplementation((chunk: string | Uint8Array) => {
    out.push(String(chunk));
    return true;
  });
  vi.spyOn(process.stderr, "write").mockImplementation((chunk: string | Uint8Array) => {
    err.push(String(chunk));
    return true;
  });
});

afterEach(() => {
  vi.restoreAllMocks();
});

function json(): Record<string, unknown> {
  expect(out).toHaveLength(1);
  expect(out[0]?.endsWith("\n")).toBe(true);
  return JSON.parse(out[0] ?? "") as Record<string, unknown>;
}

describe("deepshift limits: successful runs print one JSON line", () => {
  it.each([
    // FC 1998 Table IV (recalled): n = 3, b = 1.5 → [0, 5.92]; n = 10, b = 0.5 → [5.00, 16.00].
    { label: "fc n=3 b=1.5", args: ["--method", "fc", "--observed", "3", "--background", "1.5", "--cl", "0.9"], lower: 0, upper: 5.92 },
    { label: "fc n=10 b=0.5 (= form)", args: ["--method=fc", "--observed=10", "--background=0.5", "--cl=0.9"], lower: 5.0, upper: 16.0 },
    // PDG Poisson upper-limit table (from memory): n = 3, b = 0, 95 % → 7.75.
    { label: "classical n=3 b=0 95%", args: ["--method", "classical", "--observed", "3", "--background", "0", "--cl", "0.95"], lower: 0, upper: 7.75 },
    // n = 0: −ln(1 − CL) for any b (analytic); --cl defaults to 0.9.
    { label: "bayes n=0 b=4 default CL", args: ["--method", "bayes", "--observed", "0", "--background", "4"], lower: 0, upper: 2.3026 },
  ])("$label", async ({ args, lower, upper }) => {
    await expect(runLimitsCommand(args)).resolves.toBe(0);
    const j = json();
    expect(Object.keys(j)).toEqual(["method", "observed", "background", "cl", "lower", "upper"]);
    expect(Math.abs((j.lower as number) - lower)).toBeLessThanOrEqual(0.005);
    expect(Math.abs((j.upper as number) - upper)).toBeLessThanOrEqual(0.005);
    expect(err).toEqual([]);
  });

  it("echoes the inputs and keeps at most four decimals", async () => {
    await runLimitsCommand(["--method", "fc", "--observed", "3", "--background", "1.2", "--cl", "0.9"]);
    const j = json();
    expect(j).toMatchObject({ method: "fc", observed: 3, background: 1.2, cl: 0.9 });
    for (const key of ["lower", "upper"]) expect(String(j[key]).split(".")[1]?.length ?? 0).toBeLessThanOrEqual(4);
  });

  it("a negative classical limit prints upper null and a note", async () => {
    // s(0, 90 %) = 2.30 (PDG table) < b = 20.
    await expect(runLimitsCommand(["--method", "classical", "--observed", "0", "--background", "20"])).resolves.toBe(0);
    const j = json();
    expect(j.upper).toBeNull();
    expect(j.note).toMatch(/not a limit/);
  });
});

describe("deepshift limits: bad arguments exit 2 with one line on stderr", () => {
  it.each([
    { label: "unknown flag", args: ["--method", "fc", "--observed", "3", "--background", "1", "--bg", "2"], msg: /unknown option "--bg"/ },
    { label: "missing value", args: ["--method", "fc", "--observed", "--background", "1"], msg: /--observed needs a value/ },
    { label: "missing flag", args: ["--method", "fc", "--observed", "3"], msg: /missing --background/ },
    { label: "non-numeric", args: ["--method", "fc", "--observed", "three", "--background", "1"], msg: /--observed must be a number/ },
    { label: "hex is not accepted", args: ["--method", "fc", "--observed", "0x3", "--background", "1"], msg: /must be a number/ },
    { label: "unknown method", args: ["--method", "cls", "--observed", "3", "--background", "1"], msg: /--method must be one of/ },
    { label: "CL out of range", args: ["--method", "fc", "--observed", "3", "--background", "1", "--cl", "90"], msg: /--cl: must be a number strictly between 0 and 1/ },
    { label: "fractional count", args: ["--method", "bayes", "--observed", "1.5", "--background", "1"], msg: /--observed: must be a non-negative integer/ },
    { label: "negative background", args: ["--method", "classical", "--observed", "1", "--background", "-0.1"], msg: /--background: must be a finite number ≥ 0/ },
    { label: "stray positional", args: ["fc", "--observed", "3"], msg: /unexpected argument "fc"/ },
  ])("$label", async ({ args, msg }) => {
    await expect(runLimitsCommand(args)).resolves.toBe(2);
    expect(out).toEqual([]);
    expect(err).toHaveLength(1);
    expect(err[0]).toMatch(msg);
    expect((err[0] ?? "").trimEnd().includes("\n")).toBe(false);
  });
});
