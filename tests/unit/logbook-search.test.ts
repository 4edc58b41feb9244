import { describe, it, expect } from "vitest";
import { toBooleanQuery } from "@/lib/logbook/search-query";

// MariaDB full-text boolean mode: "+" requires a word, "*" is a prefix search, "..." a phrase (MariaDB documentation,
// "Full-Text Index Overview", from memory); InnoDB indexes words of at least innodb_ft_min_token_size = 3 characters
// and skips its default stopwords (INNODB_FT_DEFAULT_STOPWORD), so those are left out.
describe("search text → boolean-mode query", () => {
  it.each([
    { label: "two words, both required", text: "xenon purity", boolean: "+xenon +purity", ignored: [] },
    { label: "case folded", text: "Xenon PURITY", boolean: "+xenon +purity", ignored: [] },
    { label: "phrase kept", text: '"gate grid" trips', boolean: '+"gate grid" +trips', ignored: [] },
    { label: "prefix search", text: "calib*", boolean: "+calib*", ignored: [] },
    { label: "short words dropped", text: "PMT 14 gain", boolean: "+pmt +gain", ignored: ["14"] },
    { label: "stopwords dropped", text: "the pump and the valve", boolean: "+pump +and +valve", ignored: ["the", "the"] },
    { label: "operators typed by accident", text: "-foo +bar ~baz (qux) @8 >lt", boolean: "+foo +bar +baz +qux", ignored: ["8", "lt"] },
    { label: "repeated word once", text: "trip trip", boolean: "+trip", ignored: [] },
    { label: "unbalanced quote", text: 'grid "trips', boolean: "+grid +trips", ignored: [] },
    { label: "nothing searchable", text: "a of 12", boolean: "", ignored: ["a", "of", "12"] },
    { label: "non-Latin letters", text: "Kühlung µs", boolean: "+kühlung", ignored: ["µs"] },
  ])("$label: $text → $boolean", ({ text, boolean, ignored }) => {
    const q = toBooleanQuery(text);
    expect(q.boolean).toBe(boolean);
    expect(q.ignored).toEqual(ignored);
  });
});
