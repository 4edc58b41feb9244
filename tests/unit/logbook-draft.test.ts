import { describe, it, expect } from "vitest";
import { decodeDraft, draftDiffers, draftKey, encodeDraft, type DraftValues } from "@/lib/logbook/draft";

const values: DraftValues = { category: "cryogenics", title: "LN2 refill", body: "Dewar D-2 at 93 %.\n", tags: "ln2", runNumbers: "41020", needsSafetyReview: true };

describe("draft keys", () => {
  it.each([
    { entryId: null, key: "deepshift.logbook.draft:new" },
    { entryId: 42, key: "deepshift.logbook.draft:entry:42" },
  ])("$entryId → $key", ({ entryId, key }) => {
    expect(draftKey(entryId)).toBe(key);
  });
});

describe("stored drafts", () => {
  it("round-trips values, base revision and time", () => {
    const at = new Date("2025-03-05T05:40:12.000Z");
    const back = decodeDraft(encodeDraft(values, 3, at));
    expect(back).toEqual({ version: 1, savedAt: "2025-03-05T05:40:12.000Z", baseRevision: 3, values });
  });

  it.each([
    { label: "nothing stored", stored: null },
    { label: "not JSON", stored: "{oops" },
    { label: "JSON null", stored: "null" },
    { label: "another version", stored: JSON.stringify({ version: 2, savedAt: "2025-03-05T05:40:12Z", values }) },
    { label: "bad time", stored: JSON.stringify({ version: 1, savedAt: "yesterday", values }) },
    { label: "missing body", stored: JSON.stringify({ version: 1, savedAt: "2025-03-05T05:40:12Z", values: { ...values, body: undefined } }) },
    { label: "checkbox as text", stored: JSON.stringify({ version: 1, savedAt: "2025-03-05T05:40:12Z", values: { ...values, needsSafetyReview: "yes" } }) },
  ])("reads $label as no draft", ({ stored }) => {
    expect(decodeDraft(stored)).toBeNull();
  });
});

describe("is a draft worth restoring?", () => {
  it.each([
    { label: "identical", change: {}, differs: false },
    { label: "only trailing blank lines", change: { body: "Dewar D-2 at 93 %.\n\n\n" }, differs: false },
    { label: "title padded", change: { title: " LN2 refill " }, differs: false },
    { label: "one word of text", change: { body: "Dewar D-2 at 94 %.\n" }, differs: true },
    { label: "category", change: { category: "maintenance" }, differs: true },
    { label: "safety mark", change: { needsSafetyReview: false }, differs: true },
    { label: "runs", change: { runNumbers: "41020 41021" }, differs: true },
  ])("$label → $differs", ({ change, differs }) => {
    expect(draftDiffers({ ...values, ...change }, values)).toBe(differs);
  });
});
