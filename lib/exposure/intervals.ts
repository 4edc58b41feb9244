/**
 * Set arithmetic on half-open UTC-millisecond intervals [startMs, endMs).
 * "Set" here means a merged list: sorted by start, pairwise disjoint and non-adjacent, no empty spans.
 * Every public function accepts arbitrary lists and merges them first, so callers cannot get it wrong;
 * each costs O(n log n) for the sort and O(n) after it.
 */
import type { Interval } from "./types";

/** Orders intervals by start, then end, so a merge can coalesce in one pass. */
function byStartThenEnd(a: Interval, b: Interval): number {
  return a.startMs - b.startMs || a.endMs - b.endMs;
}

/** Union of a list of intervals: sorted, overlapping and touching spans coalesced, empty spans dropped. */
export function mergeIntervals(intervals: readonly Interval[]): Interval[] {
  const sorted = intervals.filter((i) => i.endMs > i.startMs).sort(byStartThenEnd);
  const merged: Interval[] = [];
  for (const { startMs, endMs } of sorted) {
    const last = merged[merged.length - 1];
    // Half-open spans that touch ([a,b) and [b,c)) leave no gap, so they coalesce too.
    if (last && startMs <= last.endMs) {
      if (endMs > last.endMs) last.endMs = endMs;
    } else {
      merged.push({ startMs, endMs });
    }
  }
  return merged;
}

/** Total length in ms of an already merged list (no overlap check; internal fast path). */
export function lengthOfMerged(merged: readonly Interval[]): number {
  let total = 0;
  for (const i of merged) total += i.endMs - i.startMs;
  return total;
}

/** Total length in ms covered by a list of intervals, counting overlapping time once. */
export function totalLength(intervals: readonly Interval[]): number {
  return lengthOfMerged(mergeIntervals(intervals));
}

/**
 * Cuts the merged set `remove` out of one span, starting the scan at index `from` of `remove`.
 * Callers that sweep spans in start order pass a pointer so each call skips what earlier spans used up.
 */
export function subtractFromSpan(span: Interval, remove: readonly Interval[], from = 0): Interval[] {
  const kept: Interval[] = [];
  let cursor = span.startMs;
  for (let k = from; k < remove.length; k++) {
    const cut = remove[k]!;
    if (cut.startMs >= span.endMs) break;
    if (cut.endMs <= cursor) continue;
    if (cut.startMs > cursor) kept.push({ startMs: cursor, endMs: cut.startMs });
    cursor = cut.endMs;
    if (cursor >= span.endMs) break;
  }
  if (cursor < span.endMs) kept.push({ startMs: cursor, endMs: span.endMs });
  return kept;
}

/** Parts of the merged set `within` that fall inside one span, scanning from index `from`. */
export function clipToSpan(span: Interval, within: readonly Interval[], from = 0): Interval[] {
  const clipped: Interval[] = [];
  for (let k = from; k < within.length; k++) {
    const piece = within[k]!;
    if (piece.startMs >= span.endMs) break;
    const startMs = Math.max(piece.startMs, span.startMs);
    const endMs = Math.min(piece.endMs, span.endMs);
    if (endMs > startMs) clipped.push({ startMs, endMs });
  }
  return clipped;
}

/** The set `from` minus the union of `remove`: time in `from` not covered by any interval of `remove`. */
export function subtractIntervals(from: readonly Interval[], remove: readonly Interval[]): Interval[] {
  const base = mergeIntervals(from);
  const cuts = mergeIntervals(remove);
  const result: Interval[] = [];
  let pointer = 0;
  for (const span of base) {
    // Both lists are sorted, so cuts ending before this span can never matter again.
    while (pointer < cuts.length && cuts[pointer]!.endMs <= span.startMs) pointer++;
    result.push(...subtractFromSpan(span, cuts, pointer));
  }
  return result;
}

/** Intersection of two lists of intervals: time covered by both unions. */
export function intersectIntervals(a: readonly Interval[], b: readonly Interval[]): Interval[] {
  const left = mergeIntervals(a);
  const right = mergeIntervals(b);
  const result: Interval[] = [];
  let i = 0;
  let j = 0;
  while (i < left.length && j < right.length) {
    const x = left[i]!;
    const y = right[j]!;
    const startMs = Math.max(x.startMs, y.startMs);
    const endMs = Math.min(x.endMs, y.endMs);
    if (endMs > startMs) result.push({ startMs, endMs });
    // Drop whichever ends first; the other may still overlap the next one.
    if (x.endMs <= y.endMs) i++;
    else j++;
  }
  return result;
}

/** Index of the first interval in a merged list whose end is after `timeMs` (binary search). */
export function firstEndingAfter(merged: readonly Interval[], timeMs: number): number {
  let lo = 0;
  let hi = merged.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (merged[mid]!.endMs <= timeMs) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
