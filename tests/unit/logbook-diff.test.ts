import { describe, it, expect } from "vitest";
import { foldUnchanged, lineDiff, revisionDiff, type RevisionSnapshot } from "@/lib/logbook/revision-diff";

const rows = (lines: { sign: string; text: string }[]) => lines.map((l) => `${l.sign}${l.text}`);

describe("line diff of the text (diff package, diffLines)", () => {
  it.each([
    { label: "one line changed", before: "a\nb\nc\n", after: "a\nB\nc\n", out: [" a", "−b", "+B", " c"] },
    { label: "line appended", before: "a\n", after: "a\nb\n", out: [" a", "+b"] },
    { label: "line removed", before: "a\nb\nc", after: "a\nc", out: [" a", "−b", " c"] },
    { label: "missing final newline is no change", before: "a\nb", after: "a\nb\n", out: [" a", " b"] },
    { label: "CR LF equals LF", before: "a\r\nb\r\n", after: "a\nb\n", out: [" a", " b"] },
    { label: "from empty", before: "", after: "x\ny", out: ["−", "+x", "+y"] },
  ])("$label", ({ before, after, out }) => {
    expect(rows(lineDiff(before, after))).toEqual(out);
  });
});

describe("folding long unchanged stretches (two lines of context, a product choice)", () => {
  const same = (n: number, from = 1) => Array.from({ length: n }, (_, i) => ({ sign: " " as const, text: `l${from + i}` }));

  it("folds ten unchanged lines before a change to a count and two lines of context", () => {
    const lines = [...same(10), { sign: "+" as const, text: "new" }];
    expect(rows(foldUnchanged(lines))).toEqual(["…8 unchanged lines", " l9", " l10", "+new"]);
  });

  it("keeps context on both sides of a change in the middle", () => {
    const lines = [...same(3), { sign: "−" as const, text: "old" }, ...same(9, 4), { sign: "+" as const, text: "new" }, ...same(4, 13)];
    // after "old": l4 l5 kept, l6..l10 folded (5), l11 l12 kept before "+new"; after "+new": l13 l14 kept, l15 l16 folded (2)
    expect(rows(foldUnchanged(lines))).toEqual([" l1", " l2", " l3", "−old", " l4", " l5", "…5 unchanged lines", " l11", " l12", "+new", " l13", " l14", "…2 unchanged lines"]);
  });

  it("does not fold a stretch that is only one line longer than its context", () => {
    const lines = [{ sign: "+" as const, text: "a" }, ...same(5), { sign: "+" as const, text: "b" }];
    expect(rows(foldUnchanged(lines))).toHaveLength(7); // 2 + 2 context + 1 would be folded to a single row: no gain
  });
});

describe("what changed between two revisions", () => {
  const r1: RevisionSnapshot = { title: "Gate grid trips", body: "Four trips at 4.9 kV.\n", tags: ["grid", "hv"], runNumbers: [41317] };

  it("reports title, tags and runs in words, and counts lines", () => {
    const r2: RevisionSnapshot = { title: "Gate grid trips — repaired", body: "Four trips at 4.9 kV.\nSection 3 isolated.\n", tags: ["grid", "repair"], runNumbers: [41317, 41318] };
    const d = revisionDiff(r1, r2);
    expect(d.fields).toEqual([
      { field: "title", from: "Gate grid trips", to: "Gate grid trips — repaired" },
      { field: "tags", added: ["repair"], removed: ["hv"] },
      { field: "runNumbers", added: [41318], removed: [] },
    ]);
    expect([d.added, d.removed]).toEqual([1, 0]);
    expect(rows(d.lines)).toEqual([" Four trips at 4.9 kV.", "+Section 3 isolated."]);
  });

  it("reports nothing for an identical revision", () => {
    const d = revisionDiff(r1, { ...r1, tags: [...r1.tags] });
    expect(d.fields).toEqual([]);
    expect([d.added, d.removed]).toEqual([0, 0]);
  });
});
