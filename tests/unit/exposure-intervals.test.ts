import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { intersectIntervals, mergeIntervals, subtractIntervals, totalLength, type Interval } from "@/lib/exposure";

// Short-hand: [a, b) pairs in ms. Expected sets below are worked out by hand on a number line.
const iv = (...pairs: Array<[number, number]>): Interval[] => pairs.map(([startMs, endMs]) => ({ startMs, endMs }));

describe("mergeIntervals", () => {
  it.each([
    { label: "empty list", input: iv(), expected: iv() }, // by hand: union of nothing is empty
    { label: "overlapping", input: iv([0, 5], [3, 8]), expected: iv([0, 8]) }, // by hand: [0,5) ∪ [3,8) = [0,8)
    { label: "adjacent half-open spans coalesce", input: iv([0, 5], [5, 8]), expected: iv([0, 8]) }, // by hand: no gap at 5
    { label: "nested", input: iv([0, 10], [2, 3]), expected: iv([0, 10]) }, // by hand: [2,3) ⊂ [0,10)
    { label: "unsorted with a gap", input: iv([10, 12], [0, 2]), expected: iv([0, 2], [10, 12]) }, // by hand: gap [2,10)
    { label: "empty and inverted spans dropped", input: iv([3, 3], [7, 4], [1, 2]), expected: iv([1, 2]) }, // by hand: [3,3) and [7,4) hold no time
    { label: "chain of three", input: iv([4, 6], [0, 2], [1, 5]), expected: iv([0, 6]) }, // by hand: [0,2)∪[1,5)∪[4,6) = [0,6)
  ])("$label", ({ input, expected }) => {
    expect(mergeIntervals(input)).toEqual(expected);
  });

  it("does not modify its input", () => {
    const input = iv([0, 5], [3, 8]);
    mergeIntervals(input);
    expect(input).toEqual(iv([0, 5], [3, 8])); // by hand: same list as given
  });
});

describe("subtractIntervals", () => {
  it.each([
    { label: "two holes", a: iv([0, 10]), b: iv([2, 3], [5, 7]), expected: iv([0, 2], [3, 5], [7, 10]) }, // by hand
    { label: "cut covers everything", a: iv([2, 4]), b: iv([0, 10]), expected: iv() }, // by hand: [2,4) ⊂ [0,10)
    { label: "disjoint cut changes nothing", a: iv([0, 2]), b: iv([5, 6]), expected: iv([0, 2]) }, // by hand
    { label: "cut spanning two spans", a: iv([0, 4], [6, 10]), b: iv([3, 7]), expected: iv([0, 3], [7, 10]) }, // by hand
    { label: "overlapping cuts removed once", a: iv([0, 10]), b: iv([2, 5], [4, 6]), expected: iv([0, 2], [6, 10]) }, // by hand: union [2,6)
    { label: "cut touching the edge only", a: iv([0, 4]), b: iv([4, 6]), expected: iv([0, 4]) }, // by hand: half-open, no shared instant
  ])("$label", ({ a, b, expected }) => {
    expect(subtractIntervals(a, b)).toEqual(expected);
  });
});

describe("intersectIntervals", () => {
  it.each([
    { label: "overlap", a: iv([0, 5]), b: iv([3, 8]), expected: iv([3, 5]) }, // by hand
    { label: "adjacent spans share nothing", a: iv([0, 5]), b: iv([5, 8]), expected: iv() }, // by hand: half-open
    { label: "several pieces", a: iv([0, 2], [4, 6], [8, 10]), b: iv([1, 9]), expected: iv([1, 2], [4, 6], [8, 9]) }, // by hand
    { label: "with empty set", a: iv([0, 5]), b: iv(), expected: iv() }, // by hand
  ])("$label", ({ a, b, expected }) => {
    expect(intersectIntervals(a, b)).toEqual(expected);
  });
});

describe("totalLength", () => {
  it.each([
    { label: "empty", input: iv(), expected: 0 }, // by hand
    { label: "overlap counted once", input: iv([0, 5], [3, 8]), expected: 8 }, // by hand: [0,8) is 8 long
    { label: "two disjoint spans", input: iv([0, 2], [4, 6]), expected: 4 }, // by hand: 2 + 2
  ])("$label", ({ input, expected }) => {
    expect(totalLength(input)).toBe(expected);
  });
});

describe("interval set laws (property)", () => {
  // Set identities (common practice): |A| = |A − B| + |A ∩ B|, and a merged list is sorted and gap-separated.
  const spans = fc.array(
    fc.tuple(fc.integer({ min: 0, max: 1000 }), fc.integer({ min: 1, max: 200 })).map(([s, d]) => ({ startMs: s, endMs: s + d })),
    { maxLength: 20 },
  );

  it("|A| = |A − B| + |A ∩ B|", () => {
    fc.assert(
      fc.property(spans, spans, (a, b) => {
        expect(totalLength(subtractIntervals(a, b)) + totalLength(intersectIntervals(a, b))).toBe(totalLength(a));
      }),
    );
  });

  it("merged output is sorted with gaps between spans", () => {
    fc.assert(
      fc.property(spans, (a) => {
        const merged = mergeIntervals(a);
        for (let k = 1; k < merged.length; k++) expect(merged[k]!.startMs).toBeGreaterThan(merged[k - 1]!.endMs);
      }),
    );
  });
});
