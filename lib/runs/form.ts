/**
 * Turning the shift crew's form fields into the same request objects the DAQ sends, so the forms go through
 * exactly the API's validation.
 */
import { RunInputError } from "./errors";
import type { RunConditions } from "./types";

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i;

/**
 * Conditions typed one per line as "name = value" (or "name: value"); values that read as numbers become
 * numbers, the rest stay text. Blank lines are skipped; a line without a separator is an error naming its line.
 */
export function conditionsFromText(text: string): RunConditions {
  const out: RunConditions = {};
  text.split(/\r?\n/).forEach((raw, i) => {
    const line = raw.trim();
    if (!line) return;
    const at = line.search(/[=:]/);
    if (at <= 0) throw new RunInputError("conditions", `line ${i + 1} should read "name = value" (got "${line}")`);
    const name = line.slice(0, at).trim();
    const value = line.slice(at + 1).trim();
    if (!value) throw new RunInputError("conditions", `line ${i + 1}: "${name}" has no value`);
    if (name in out) throw new RunInputError("conditions", `line ${i + 1}: "${name}" is given twice`);
    out[name] = NUMBER.test(value) ? Number(value) : value;
  });
  return out;
}

/** Conditions back to the form's text, one "name = value" a line. */
export function conditionsToText(c: RunConditions): string {
  return Object.entries(c)
    .map(([k, v]) => `${k} = ${v}`)
    .join("\n");
}

/** A datetime-local field's value (no zone; the form says UTC) as zoned ISO text; empty stays undefined. */
export function utcFromFormInput(value: string): string | undefined {
  const v = value.trim();
  if (!v) return undefined;
  return /(?:Z|[+-]\d{2}:\d{2})$/i.test(v) ? v : `${v.length === 16 ? `${v}:00` : v}Z`;
}

/** A number typed in a form: empty → undefined (so the API's "is required" applies), else Number (NaN stays NaN → refused). */
export function numberFromFormInput(value: string): number | undefined {
  const v = value.trim().replace(/[\s_]/g, "");
  return v === "" ? undefined : Number(v);
}
