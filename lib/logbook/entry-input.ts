/** Parsing of the small structured fields of an entry: tags and linked run numbers, as typed by a writer. */
import { LogbookInputError } from "./errors";

export const MAX_TAGS = 20;
export const MAX_TAG_CHARS = 60; // the entry_tags.tag column
export const MAX_RUNS = 50;
export const MAX_TITLE_CHARS = 200; // the entry_revisions.title column
// MEDIUMTEXT holds 16 MiB; a logbook entry of half a megabyte of markdown is already far beyond any real one.
export const MAX_BODY_CHARS = 500_000;

const TAG_SHAPE = /^[\p{L}\p{N}][\p{L}\p{N}._+-]*$/u;

/** Normalise tags: trimmed, lower case, spaces become "-", a leading "#" dropped, duplicates removed, order kept. */
export function normaliseTags(input: string | readonly string[]): string[] {
  const parts = typeof input === "string" ? input.split(/[,;\n]/) : input;
  const out: string[] = [];
  for (const part of parts) {
    const tag = part.trim().replace(/^#+/, "").trim().toLowerCase().replace(/\s+/g, "-");
    if (tag === "") continue;
    if (Array.from(tag).length > MAX_TAG_CHARS) {
      throw new LogbookInputError("invalid_tag", "tags", `the tag "${tag.slice(0, 20)}…" is longer than ${MAX_TAG_CHARS} characters`);
    }
    if (!TAG_SHAPE.test(tag)) {
      throw new LogbookInputError("invalid_tag", "tags", `the tag "${tag}" may hold only letters, digits and . _ + -`);
    }
    if (!out.includes(tag)) out.push(tag);
  }
  if (out.length > MAX_TAGS) throw new LogbookInputError("too_many", "tags", `at most ${MAX_TAGS} tags per entry (got ${out.length})`);
  return out;
}

/** Parse linked run numbers ("1203, 1204 1210" or an array): positive whole numbers, duplicates removed, sorted. */
export function parseRunNumbers(input: string | readonly (number | string)[]): number[] {
  const parts = typeof input === "string" ? input.split(/[\s,;]+/) : input.map(String);
  const out = new Set<number>();
  for (const raw of parts) {
    const text = raw.trim().replace(/^#/, "");
    if (text === "") continue;
    if (!/^\d{1,9}$/.test(text) || Number(text) < 1) {
      throw new LogbookInputError("invalid_run_number", "runNumbers", `"${raw.trim()}" is not a run number (a whole number from 1)`);
    }
    out.add(Number(text));
  }
  if (out.size > MAX_RUNS) throw new LogbookInputError("too_many", "runNumbers", `at most ${MAX_RUNS} linked runs per entry (got ${out.size})`);
  return [...out].sort((a, b) => a - b);
}
