/**
 * A readable difference between two consecutive revisions of an entry: which fields changed, and a line diff of
 * the text with every line marked "+" (added), "−" (removed) or " " (unchanged), so the change never depends on colour.
 * Long unchanged stretches are folded to a count, keeping a little context around each change.
 */
import { diffLines } from "diff";

export type RevisionSnapshot = { title: string; body: string; tags: readonly string[]; runNumbers: readonly number[] };

export type DiffLine =
  | { sign: "+" | "−" | " "; text: string }
  | { sign: "…"; text: string; folded: number };

export type FieldChange =
  | { field: "title"; from: string; to: string }
  | { field: "tags"; added: string[]; removed: string[] }
  | { field: "runNumbers"; added: number[]; removed: number[] };

export type RevisionDiff = { fields: FieldChange[]; lines: DiffLine[]; added: number; removed: number };

function splitLines(value: string): string[] {
  const lines = value.split("\n");
  if (lines.length > 1 && lines[lines.length - 1] === "") lines.pop(); // a trailing newline ends the last line
  return lines;
}

/** The raw line diff of two texts, every line marked with its sign; a missing final newline is not a change. */
export function lineDiff(before: string, after: string): { sign: "+" | "−" | " "; text: string }[] {
  const norm = (s: string) => (s.endsWith("\n") ? s : `${s}\n`);
  const out: { sign: "+" | "−" | " "; text: string }[] = [];
  for (const change of diffLines(norm(before.replace(/\r\n/g, "\n")), norm(after.replace(/\r\n/g, "\n")))) {
    const sign = change.added ? "+" : change.removed ? "−" : " ";
    for (const text of splitLines(change.value)) out.push({ sign, text });
  }
  return out;
}

/** Fold unchanged runs longer than 2 × context + 1 lines into one "… N unchanged lines" row. */
export function foldUnchanged(lines: readonly { sign: "+" | "−" | " "; text: string }[], context = 2): DiffLine[] {
  const out: DiffLine[] = [];
  let i = 0;
  while (i < lines.length) {
    if (lines[i]?.sign !== " ") {
      out.push(lines[i]!);
      i++;
      continue;
    }
    let j = i;
    while (j < lines.length && lines[j]?.sign === " ") j++;
    const run = lines.slice(i, j);
    const keepHead = i === 0 ? 0 : context; // context after a change
    const keepTail = j === lines.length ? 0 : context; // context before a change
    if (run.length > keepHead + keepTail + 1) {
      out.push(...run.slice(0, keepHead));
      const folded = run.length - keepHead - keepTail;
      out.push({ sign: "…", text: `${folded} unchanged line${folded === 1 ? "" : "s"}`, folded });
      out.push(...run.slice(run.length - keepTail));
    } else {
      out.push(...run);
    }
    i = j;
  }
  return out;
}

function setChange<T>(before: readonly T[], after: readonly T[]): { added: T[]; removed: T[] } {
  return { added: after.filter((x) => !before.includes(x)), removed: before.filter((x) => !after.includes(x)) };
}

/** What changed from one revision to the next: fields, folded text lines, and the counts of added/removed lines. */
export function revisionDiff(before: RevisionSnapshot, after: RevisionSnapshot, context = 2): RevisionDiff {
  const fields: FieldChange[] = [];
  if (before.title !== after.title) fields.push({ field: "title", from: before.title, to: after.title });
  const tags = setChange(before.tags, after.tags);
  if (tags.added.length || tags.removed.length) fields.push({ field: "tags", ...tags });
  const runs = setChange(before.runNumbers, after.runNumbers);
  if (runs.added.length || runs.removed.length) fields.push({ field: "runNumbers", ...runs });
  const raw = lineDiff(before.body, after.body);
  return {
    fields,
    lines: foldUnchanged(raw, context),
    added: raw.filter((l) => l.sign === "+").length,
    removed: raw.filter((l) => l.sign === "−").length,
  };
}
