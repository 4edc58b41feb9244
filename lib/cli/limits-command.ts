/**
 * `deepshift limits`: one Poisson limit, printed as a single line of JSON.
 *   limits --method fc|classical|bayes --observed N --background B [--cl CL]
 * Exit codes: 0 on success, 2 on bad arguments (a one-line message on stderr).
 */
import { LIMIT_METHODS, LimitInputError, computeLimit, type LimitMethod, type LimitResult } from "../limits";

const USAGE = "usage: deepshift limits --method fc|classical|bayes --observed N --background B [--cl CL (default 0.9)]";

type Flag = "method" | "observed" | "background" | "cl";
const FLAGS: readonly Flag[] = ["method", "observed", "background", "cl"];

class UsageError extends Error {}

// Plain decimal or exponent notation only; Number() alone would also take "", "0x10" or " 3 ".
const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

function parseFlags(args: string[]): Partial<Record<Flag, string>> {
  const values: Partial<Record<Flag, string>> = {};
  for (let i = 0; i < args.length; i++) {
    const arg = args[i] ?? "";
    if (!arg.startsWith("--")) throw new UsageError(`unexpected argument "${arg}"`);
    const eq = arg.indexOf("=");
    const name = arg.slice(2, eq === -1 ? undefined : eq);
    if (!(FLAGS as readonly string[]).includes(name)) throw new UsageError(`unknown option "--${name}"`);
    const flag = name as Flag;
    let value: string | undefined;
    if (eq !== -1) value = arg.slice(eq + 1);
    else if (i + 1 < args.length && !(args[i + 1] ?? "").startsWith("--")) value = args[++i];
    if (value === undefined || value === "") throw new UsageError(`option --${flag} needs a value`);
    if (values[flag] !== undefined) throw new UsageError(`option --${flag} given twice`);
    values[flag] = value;
  }
  return values;
}

function parseNumber(flag: Flag, text: string): number {
  if (!NUMBER_PATTERN.test(text)) throw new UsageError(`--${flag} must be a number (got "${text}")`);
  return Number(text);
}

function required(values: Partial<Record<Flag, string>>, flag: Flag): string {
  const v = values[flag];
  if (v === undefined) throw new UsageError(`missing --${flag}`);
  return v;
}

// Edges are resolved to about 1e-6 or better; four decimals is what a limit is quoted to.
function round4(x: number): number {
  return Math.round(x * 1e4) / 1e4;
}

/** The JSON line for one result: the inputs, lower, upper (null for no limit) and note when present. */
export function formatLimitJson(r: LimitResult): string {
  const out: Record<string, string | number | null> = {
    method: r.method,
    observed: r.observed,
    background: r.background,
    cl: r.cl,
    lower: round4(r.lower),
    upper: r.upper === null ? null : round4(r.upper),
  };
  if (r.note) out.note = r.note;
  return JSON.stringify(out);
}

/** Runs `deepshift limits` with the arguments after the command name; resolves to the exit code. */
export async function runLimitsCommand(args: string[]): Promise<number> {
  if (args.includes("--help") || args.includes("-h")) {
    process.stdout.write(USAGE + "\n");
    return 0;
  }
  try {
    const values = parseFlags(args);
    const method = required(values, "method");
    if (!(LIMIT_METHODS as readonly string[]).includes(method)) {
      throw new UsageError(`--method must be one of ${LIMIT_METHODS.join(", ")} (got "${method}")`);
    }
    const observed = parseNumber("observed", required(values, "observed"));
    const background = parseNumber("background", required(values, "background"));
    const cl = values.cl === undefined ? 0.9 : parseNumber("cl", values.cl);
    const result = computeLimit(method as LimitMethod, observed, background, cl);
    process.stdout.write(formatLimitJson(result) + "\n");
    return 0;
  } catch (err) {
    if (err instanceof UsageError) {
      process.stderr.write(`deepshift limits: ${err.message} (see deepshift limits --help)\n`);
      return 2;
    }
    if (err instanceof LimitInputError) {
      const flag = err.field === "cl" || err.field === "observed" || err.field === "background" ? `--${err.field}` : err.field;
      process.stderr.write(`deepshift limits: ${flag}: ${err.reason}\n`);
      return 2;
    }
    throw err;
  }
}
