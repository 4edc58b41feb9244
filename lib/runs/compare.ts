/**
 * Retry or conflict? The DAQ may send the same open or close twice (a lost reply, a restart). A repeat that
 * matches what is recorded is harmless; one that differs is a conflict. These list the fields that differ.
 */
import { canonicalDecimal } from "./decimal";
import type { CloseRunInput, OpenRunInput, RunConditions, RunStatus } from "./types";

/** What is recorded about a run's opening, in the same terms as an open request. */
export interface RecordedOpen {
  type: string;
  startMs: number;
  detector: string;
  conditions: RunConditions;
  targetMassOverrideKg: string | null;
}

/** What is recorded about a run's closing (all null while it runs). */
export interface RecordedClose {
  status: RunStatus;
  endMs: number | null;
  liveSeconds: number | null;
  deadSeconds: number | null;
  triggerCount: number | null;
}

/** Conditions as text with sorted names, so that key order never makes two equal sets differ. */
export function conditionsKey(c: RunConditions): string {
  return JSON.stringify(Object.keys(c).sort().map((k) => [k, c[k]]));
}

function sameDecimal(a: string | null, b: string | null): boolean {
  if (a === null || b === null) return a === b;
  return canonicalDecimal(a) === canonicalDecimal(b);
}

/** Request fields (API names) in which an open request differs from the recorded run; empty means a retry. */
export function openDifferences(recorded: RecordedOpen, request: OpenRunInput): string[] {
  const out: string[] = [];
  if (recorded.type !== request.type) out.push("type");
  if (recorded.startMs !== request.startMs) out.push("start");
  if (recorded.detector !== request.detector) out.push("detector");
  if (conditionsKey(recorded.conditions) !== conditionsKey(request.conditions)) out.push("conditions");
  if (!sameDecimal(recorded.targetMassOverrideKg, request.targetMassOverrideKg)) out.push("targetMassOverrideKg");
  return out;
}

/** Request fields in which a close differs from an already closed run; empty means a retry. */
export function closeDifferences(recorded: RecordedClose, request: CloseRunInput): string[] {
  const out: string[] = [];
  if (recorded.endMs !== request.endMs) out.push("end");
  if (recorded.liveSeconds !== request.liveSeconds) out.push("liveSeconds");
  if (recorded.deadSeconds !== request.deadSeconds) out.push("deadSeconds");
  if (recorded.triggerCount !== request.triggerCount) out.push("triggerCount");
  if (recorded.status !== request.status) out.push("status");
  return out;
}
