/**
 * Shape checks of the run requests (DAQ API bodies, form data turned into the same objects, list queries).
 * zod checks the shape; the first problem becomes a RunInputError naming the field, so every caller answers alike.
 */
import { z } from "zod";
import { RunInputError } from "./errors";
import { parsePositiveDecimal } from "./decimal";
import { parseInstant, parseQueryInstant } from "./instant";
import { decodeCursor } from "./cursor";
import {
  CLOSING_STATUSES,
  DEFAULT_DETECTOR,
  DETECTORS,
  RUN_STATUSES,
  RUN_TYPES,
  type CloseRunInput,
  type ConfigInput,
  type OpenRunInput,
  type RunListQuery,
} from "./types";

/** Largest run number the column holds (signed 32-bit). */
export const MAX_RUN_NUMBER = 2_147_483_647;
/** Largest page of the runs list. */
export const MAX_LIST_LIMIT = 200;
/** Page size of the runs list when the query names none. */
export const DEFAULT_LIST_LIMIT = 50;
/** Masses: DECIMAL(12,4) → 8 whole digits, 4 decimals. */
const MASS_SCALE = 4;
const MASS_WHOLE_DIGITS = 8;
const MAX_CONDITIONS = 40;

/** A zod error message that says "is required" when the field is missing and `text` otherwise. */
const says = (text: string) => ({ error: (iss: { input?: unknown }) => (iss.input === undefined ? "is required" : text) });
const oneOf = (list: readonly string[]) => says(`must be one of: ${list.join(", ")}`);

const conditionValue = z.union([z.string().max(200, "values are at most 200 characters"), z.number()], says("values must be text or numbers"));
const conditions = z
  .record(z.string().trim().min(1, "names must not be empty").max(60, "names are at most 60 characters"), conditionValue, says("must be an object of name → value"))
  .refine((c) => Object.keys(c).length <= MAX_CONDITIONS, `at most ${MAX_CONDITIONS} conditions`);
const decimalLike = z.union([z.number(), z.string()], says("must be a decimal number in kg"));

const openSchema = z.strictObject({
  number: z.int(says("must be a whole number")).min(1, "must be positive").max(MAX_RUN_NUMBER, `must be at most ${MAX_RUN_NUMBER}`),
  type: z.enum(RUN_TYPES, oneOf(RUN_TYPES)),
  start: z.unknown(),
  detector: z.enum(DETECTORS, oneOf(DETECTORS)).optional(),
  conditions: conditions.optional(),
  targetMassOverrideKg: decimalLike.nullable().optional(),
});

const closeSchema = z.strictObject({
  end: z.unknown(),
  liveSeconds: z.number(says("must be a number of seconds")),
  deadSeconds: z.number(says("must be a number of seconds")),
  triggerCount: z.int(says("must be a whole number")).min(0, "must not be negative"),
  status: z.enum(CLOSING_STATUSES, oneOf(CLOSING_STATUSES)).optional(),
});

const configSchema = z.strictObject({
  detector: z.enum(DETECTORS, oneOf(DETECTORS)),
  name: z.string(says("must be text")).trim().min(2, "must be at least 2 characters").max(120, "must be at most 120 characters"),
  targetMaterial: z.string(says("must be text")).trim().min(2, "must be at least 2 characters").max(60, "must be at most 60 characters"),
  fiducialMassKg: decimalLike,
  effectiveFrom: z.unknown(),
  notes: z.string().trim().max(2000, "must be at most 2000 characters").nullable().optional(),
});

/** The first zod issue as a RunInputError: unknown fields are named, nested paths are dotted. */
function toInputError(error: z.ZodError): RunInputError {
  const issue = error.issues[0];
  if (!issue) return new RunInputError("body", "is not valid");
  if (issue.code === "unrecognized_keys") return new RunInputError(issue.keys[0] ?? "body", "is not a field of this request");
  const field = issue.path.length ? issue.path.map(String).join(".") : "body";
  return new RunInputError(field, issue.message);
}

function shaped<T>(schema: z.ZodType<T>, body: unknown): T {
  if (typeof body !== "object" || body === null || Array.isArray(body)) throw new RunInputError("body", "must be a JSON object");
  const r = schema.safeParse(body);
  if (!r.success) throw toInputError(r.error);
  return r.data;
}

/** Round seconds to the millisecond the columns keep, so a retried close compares equal to what was stored. */
export function toMillisecondSeconds(seconds: number): number {
  return Math.round(seconds * 1000) / 1000;
}

/** Validate a request to open a run ({number, type, start, detector?, conditions?, targetMassOverrideKg?}). */
export function parseOpenRequest(body: unknown): OpenRunInput {
  const v = shaped(openSchema, body);
  const override = v.targetMassOverrideKg;
  return {
    number: v.number,
    type: v.type,
    startMs: parseInstant(v.start, "start"),
    detector: v.detector ?? DEFAULT_DETECTOR,
    conditions: v.conditions ?? {},
    targetMassOverrideKg:
      override === undefined || override === null ? null : parsePositiveDecimal(override, "targetMassOverrideKg", MASS_SCALE, MASS_WHOLE_DIGITS),
  };
}

/** Validate the shape of a request to close a run ({end, liveSeconds, deadSeconds, triggerCount, status?}). */
export function parseCloseRequest(body: unknown): CloseRunInput {
  const v = shaped(closeSchema, body);
  return {
    endMs: parseInstant(v.end, "end"),
    liveSeconds: toMillisecondSeconds(v.liveSeconds),
    deadSeconds: toMillisecondSeconds(v.deadSeconds),
    triggerCount: v.triggerCount,
    status: v.status ?? "ended",
  };
}

/** Validate a new detector configuration ({detector, name, targetMaterial, fiducialMassKg, effectiveFrom, notes?}). */
export function parseConfigRequest(body: unknown): ConfigInput {
  const v = shaped(configSchema, body);
  return {
    detector: v.detector,
    name: v.name,
    targetMaterial: v.targetMaterial,
    fiducialMassKg: parsePositiveDecimal(v.fiducialMassKg, "fiducialMassKg", MASS_SCALE, MASS_WHOLE_DIGITS),
    effectiveFromMs: parseInstant(v.effectiveFrom, "effectiveFrom"),
    notes: v.notes ? v.notes : null,
  };
}

function oneOfOrNull<T extends string>(list: readonly T[], value: string | null, field: string): T | null {
  if (value === null || value === "") return null;
  if (!(list as readonly string[]).includes(value)) throw new RunInputError(field, `must be one of: ${list.join(", ")}`);
  return value as T;
}

/** Validate the runs-list query (type, status, from, to, cursor, limit ≤ 200). */
export function parseListQuery(params: URLSearchParams): RunListQuery {
  const from = params.get("from");
  const to = params.get("to");
  const fromMs = from ? parseQueryInstant(from, "from") : null;
  const toMs = to ? parseQueryInstant(to, "to") : null;
  if (fromMs !== null && toMs !== null && toMs <= fromMs) throw new RunInputError("to", "must be after from");
  const limitText = params.get("limit");
  let limit = DEFAULT_LIST_LIMIT;
  if (limitText !== null && limitText !== "") {
    if (!/^\d+$/.test(limitText)) throw new RunInputError("limit", "must be a whole number");
    limit = Number(limitText);
    if (limit < 1 || limit > MAX_LIST_LIMIT) throw new RunInputError("limit", `must be between 1 and ${MAX_LIST_LIMIT}`);
  }
  const cursor = params.get("cursor");
  return {
    type: oneOfOrNull(RUN_TYPES, params.get("type"), "type"),
    status: oneOfOrNull(RUN_STATUSES, params.get("status"), "status"),
    fromMs,
    toMs,
    cursor: cursor ? decodeCursor(cursor) : null,
    limit,
  };
}
