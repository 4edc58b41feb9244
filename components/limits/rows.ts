/**
 * The plain data the limits page hands its client components: one row per period, with the observed count
 * already withheld for blind periods (the server builds rows with visibleInput, so n never reaches the browser).
 */
import type { LimitMethod } from "@/lib/limits";
import { visibleInput, type CombinablePeriod } from "@/lib/limits-view";

/** One period on the limits page. */
export type LimitRow = {
  id: number;
  name: string;
  startAt: string;
  endAt: string;
  blind: boolean;
  unblindedAt: string | null;
  acceptance: number;
  exposureKgDay: number | null;
  exposureTonneYear: number | null;
  /** Null when not recorded, and always null while the period is blind. */
  observed: number | null;
  background: number | null;
  backgroundNote: string | null;
  quotedMethod: LimitMethod;
  quotedCl: number;
};

/** Builds a row from a period definition, its counting fields and its exposure (n dropped while blind). */
export function limitRow(
  p: { id: number; name: string; startAt: Date; endAt: Date; blind: boolean; signalAcceptance: number },
  c: { observedCount: number | null; expectedBackground: number | null; backgroundNote: string | null; limitMethod: LimitMethod; confidenceLevel: number; unblindedAt: Date | null } | undefined,
  exposure: { exposureKgDay: number; exposureTonneYear: number } | undefined,
): LimitRow {
  const input = visibleInput({
    blind: p.blind,
    observedCount: c?.observedCount ?? null,
    expectedBackground: c?.expectedBackground ?? null,
    signalAcceptance: p.signalAcceptance,
    exposureKgDay: exposure?.exposureKgDay ?? null,
  });
  return {
    id: p.id,
    name: p.name,
    startAt: p.startAt.toISOString(),
    endAt: p.endAt.toISOString(),
    blind: p.blind,
    unblindedAt: c?.unblindedAt ? c.unblindedAt.toISOString() : null,
    acceptance: input.acceptance,
    exposureKgDay: input.exposureKgDay,
    exposureTonneYear: exposure?.exposureTonneYear ?? null,
    observed: input.observed,
    background: input.background,
    backgroundNote: c?.backgroundNote ?? null,
    quotedMethod: c?.limitMethod ?? "fc",
    quotedCl: c?.confidenceLevel ?? 0.9,
  };
}

/** A row as the view helpers take it. */
export function combinable(row: LimitRow): CombinablePeriod {
  return {
    id: row.id,
    name: row.name,
    blind: row.blind,
    observed: row.blind ? null : row.observed,
    background: row.background,
    acceptance: row.acceptance,
    exposureKgDay: row.exposureKgDay,
  };
}
