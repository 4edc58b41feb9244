import { describe, it, expect } from "vitest";
import { MAX_TAGS, normaliseTags, parseRunNumbers } from "@/lib/logbook/entry-input";
import { LogbookInputError } from "@/lib/logbook/errors";

const refusal = (fn: () => unknown) => {
  try {
    fn();
  } catch (err) {
    if (err instanceof LogbookInputError) return { code: err.code, field: err.field, message: err.message };
    throw err;
  }
  return null;
};

describe("tags", () => {
  it.each([
    { label: "comma list with case and duplicates", input: " #PMT, gain ,pmt", tags: ["pmt", "gain"] },
    { label: "spaces inside become hyphens", input: "Xenon Purity; LN2", tags: ["xenon-purity", "ln2"] },
    { label: "array input", input: ["Kr83m", "energy-scale", ""], tags: ["kr83m", "energy-scale"] },
    { label: "accented letters are letters", input: "Lüftung", tags: ["lüftung"] },
    { label: "empty", input: "", tags: [] },
  ])("$label → $tags", ({ input, tags }) => {
    expect(normaliseTags(input)).toEqual(tags);
  });

  it.each([
    { label: "a slash", input: "bad/tag", code: "invalid_tag" },
    { label: "starting with a hyphen", input: "-x", code: "invalid_tag" },
    { label: "61 characters (column holds 60)", input: "a".repeat(61), code: "invalid_tag" },
    { label: "one tag too many", input: Array.from({ length: MAX_TAGS + 1 }, (_, i) => `t${i}`), code: "too_many" },
  ])("refuses $label", ({ input, code }) => {
    expect(refusal(() => normaliseTags(input))).toMatchObject({ code, field: "tags" });
  });
});

describe("linked run numbers", () => {
  it.each([
    { label: "commas and spaces, duplicates", input: "41020, 41019 41020", runs: [41019, 41020] },
    { label: "hash prefix", input: "#41020", runs: [41020] },
    { label: "array of numbers and strings", input: [41022, "41021"], runs: [41021, 41022] },
    { label: "blank", input: "  ", runs: [] },
  ])("$label → $runs", ({ input, runs }) => {
    expect(parseRunNumbers(input)).toEqual(runs);
  });

  it.each([
    { label: "zero", input: "0" },
    { label: "decimal", input: "4102.5" },
    { label: "letter O for zero", input: "41O2" },
    { label: "negative", input: "-4" },
    { label: "ten digits", input: "1234567890" },
  ])("refuses $label with the typed text in the message", ({ input }) => {
    const r = refusal(() => parseRunNumbers(input));
    expect(r).toMatchObject({ code: "invalid_run_number", field: "runNumbers" });
    expect(r?.message).toContain(`"${input}"`);
  });
});
