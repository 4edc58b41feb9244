/**
 * Drafts kept in the browser while a writer types, so that a crash or a lost connection loses nothing.
 * This module only names, encodes and compares drafts; the form reads and writes localStorage.
 */

export type DraftValues = {
  category: string;
  title: string;
  body: string;
  tags: string;
  runNumbers: string;
  needsSafetyReview: boolean;
};

export type Draft = { version: 1; savedAt: string; baseRevision: number | null; values: DraftValues };

const PREFIX = "deepshift.logbook.draft";

/** The storage key of a draft: one for a new entry, one per entry being edited. */
export function draftKey(entryId: number | null): string {
  return entryId === null ? `${PREFIX}:new` : `${PREFIX}:entry:${entryId}`;
}

/** Encode a draft for storage. */
export function encodeDraft(values: DraftValues, baseRevision: number | null, now: Date): string {
  const draft: Draft = { version: 1, savedAt: now.toISOString(), baseRevision, values };
  return JSON.stringify(draft);
}

/** Decode a stored draft; anything malformed (old format, hand-edited, truncated) reads as no draft. */
export function decodeDraft(stored: string | null): Draft | null {
  if (!stored) return null;
  let parsed: unknown;
  try {
    parsed = JSON.parse(stored);
  } catch {
    return null;
  }
  if (typeof parsed !== "object" || parsed === null) return null;
  const d = parsed as Partial<Draft>;
  const v = d.values as Partial<DraftValues> | undefined;
  if (d.version !== 1 || typeof d.savedAt !== "string" || Number.isNaN(Date.parse(d.savedAt)) || !v) return null;
  const strings = [v.category, v.title, v.body, v.tags, v.runNumbers];
  if (!strings.every((s) => typeof s === "string") || typeof v.needsSafetyReview !== "boolean") return null;
  const baseRevision = typeof d.baseRevision === "number" ? d.baseRevision : null;
  return { version: 1, savedAt: d.savedAt, baseRevision, values: v as DraftValues };
}

/** True when a draft holds something the saved (or preset) values do not; blank-line noise is not a difference. */
export function draftDiffers(draft: DraftValues, initial: DraftValues): boolean {
  const body = (s: string) => s.replace(/\s+$/g, "").replace(/\n{3,}/g, "\n\n");
  return (
    draft.category !== initial.category ||
    draft.title.trim() !== initial.title.trim() ||
    body(draft.body) !== body(initial.body) ||
    draft.tags.trim() !== initial.tags.trim() ||
    draft.runNumbers.trim() !== initial.runNumbers.trim() ||
    draft.needsSafetyReview !== initial.needsSafetyReview
  );
}
