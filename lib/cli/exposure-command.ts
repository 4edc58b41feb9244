/**
 * `deepshift exposure --input LEDGER.json|-`: exposure per data-quality period from a JSON ledger of
 * runs, confirmed flags and periods. Prints one line of JSON; bad input exits 2 with a one-line reason.
 */
import { readFile } from "node:fs/promises";
import { z } from "zod";
import {
  computePeriodsExposure,
  ExposureInputError,
  type DataQualityPeriod,
  type ExposureFlag,
  type ExposureRun,
} from "../exposure";

const USAGE = "usage: deepshift exposure --input LEDGER.json   (use --input - to read the ledger from stdin)";

/** Ledger problems found before the exposure code runs (arguments, file, JSON, schema). */
export class LedgerInputError extends Error {
  readonly code = "LEDGER_INPUT_INVALID";
  constructor(
    readonly field: string,
    readonly reason: string,
  ) {
    super(`${field}: ${reason}`);
    this.name = "LedgerInputError";
  }
}

// Timestamps must carry a zone ("Z" or "+01:00"): a bare local time would shift exposure by hours.
const isoTime = z.iso.datetime({ offset: true });
const runType = z.enum(["science", "calibration", "background", "noise", "commissioning"]);
const recordId = z.union([z.string(), z.number()]).optional();

const ledgerSchema = z.object({
  runs: z.array(
    z.object({
      id: recordId,
      number: z.number().int(),
      type: runType,
      start: isoTime,
      end: isoTime.nullable(),
      liveSeconds: z.number(),
      targetMassKg: z.number(),
    }),
  ),
  flags: z
    .array(
      z.object({
        id: recordId,
        start: isoTime,
        end: isoTime,
        verdict: z.enum(["exclude", "caution"]),
        subsystem: z.string().optional(),
      }),
    )
    .default([]),
  periods: z
    .array(z.object({ name: z.string().min(1), start: isoTime, end: isoTime, runTypes: z.array(runType) }))
    .min(1),
});

type Ledger = z.infer<typeof ledgerSchema>;

/** Optional hooks so tests can feed stdin without a real pipe. */
export interface ExposureCommandIo {
  readStdin?: () => Promise<string>;
}

async function readAllStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(typeof chunk === "string" ? Buffer.from(chunk) : (chunk as Buffer));
  return Buffer.concat(chunks).toString("utf8");
}

/** Returns the --input value, or null when help was asked for. */
function parseArgs(args: string[]): string | null {
  let input: string | undefined;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg === "--help" || arg === "-h") return null;
    if (arg === "--input") {
      input = args[++i];
      if (input === undefined) throw new LedgerInputError("--input", "needs a file name (or - for stdin)");
    } else if (arg.startsWith("--input=")) {
      input = arg.slice("--input=".length);
      } else {
      throw new LedgerInputError(arg, "unknown option");
    }
  }
  if (!input) throw new LedgerInputError("--input", "is required");
  return input;
}

async function readLedgerText(input: string, io: ExposureCommandIo): Promise<string> {
  if (input === "-") return (io.readStdin ?? readAllStdin)();
  try {
    return await readFile(input, "utf8");
  } catch (err) {
    const reason = (err as NodeJS.ErrnoException).code === "ENOENT" ? "no such file" : (err as Error).message;
    throw new LedgerInputError(input, `cannot read ledger (${reason})`);
  }
}

function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, key) => (typeof key === "number" ? `${out}[${key}]` : out ? `${out}.${String(key)}` : String(key)), "");
}

function parseLedger(text: string, source: string): Ledger {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    throw new LedgerInputError(source, `is not valid JSON (${(err as Error).message})`);
  }
  const parsed = ledgerSchema.safeParse(json);
  if (parsed.success) return parsed.data;
  const issues = parsed.error.issues.slice(0, 3).map((issue) => `${formatPath(issue.path) || "(root)"}: ${issue.message}`);
  const more = parsed.error.issues.length > 3 ? ` (and ${parsed.error.issues.length - 3} more)` : "";
  throw new LedgerInputError(source, `${issues.join("; ")}${more}`);
}

/** Converts the validated ledger into the exposure library's millisecond records. */
function toExposureInputs(ledger: Ledger): { runs: ExposureRun[]; flags: ExposureFlag[]; periods: DataQualityPeriod[] } {
  const runs = ledger.runs.map((r): ExposureRun => ({
    ...(r.id !== undefined && { id: r.id }),
    number: r.number,
    type: r.type,
    startMs: Date.parse(r.start),
    endMs: r.end === null ? null : Date.parse(r.end),
    liveSeconds: r.liveSeconds,
    targetMassKg: r.targetMassKg,
  }));
  const flags = ledger.flags.map((f): ExposureFlag => ({
    ...(f.id !== undefined && { id: f.id }),
    ...(f.subsystem !== undefined && { subsystem: f.subsystem }),
    startMs: Date.parse(f.start),
    endMs: Date.parse(f.end),
    verdict: f.verdict,
  }));
  const periods = ledger.periods.map((p) => ({ name: p.name, startMs: Date.parse(p.start), endMs: Date.parse(p.end), runTypes: p.runTypes }));
  return { runs, flags, periods };
}

/** Keeps stderr to one line per error even if a message carries newlines. */
function oneLine(message: string): string {
  return message.replace(/\s*\n\s*/g, " ");
}

/** Runs the exposure subcommand; resolves to the process exit code (0 ok, 2 bad input, 1 unexpected). */
export async function runExposureCommand(args: string[], io: ExposureCommandIo = {}): Promise<number> {
  try {
    const input = parseArgs(args);
    if (input === null) {
      process.stdout.write(USAGE + "\n");
      return 0;
    }
    const source = input === "-" ? "stdin" : input;
    const { runs, flags, periods } = toExposureInputs(parseLedger(await readLedgerText(input, io), source));
    const summaries = computePeriodsExposure(runs, flags, periods);
    const out = summaries.map(({ period, totals }) => ({
      name: period.name,
      runs: totals.runs,
      liveSeconds: totals.liveSeconds,
      goodLiveSeconds: totals.goodLiveSeconds,
      lostLiveSeconds: totals.lostLiveSeconds,
      exposureKgDay: totals.exposureKgDay,
      exposureTonneYear: totals.exposureTonneYear,
      openRuns: totals.openRuns,
    }));
    process.stdout.write(JSON.stringify({ periods: out }) + "\n");
    return 0;
  } catch (err) {
    if (err instanceof LedgerInputError || err instanceof ExposureInputError) {
      const hint = err instanceof LedgerInputError && err.field.startsWith("-") ? " (see --help)" : "";
      process.stderr.write(`deepshift exposure: ${oneLine(err.message)}${hint}\n`);
      return 2;
    }
    process.stderr.write(`deepshift exposure: unexpected error: ${oneLine(err instanceof Error ? err.message : String(err))}\n`);
    return 1;
  }
}
