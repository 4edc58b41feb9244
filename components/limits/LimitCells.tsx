/**
 * Table cells for one limit view: the μ interval and the rate interval in both units, each followed by the
 * method and CL; or, in their place, the blind notice, the waiting notice, the calculator's refusal, or the
 * classical "no limit" note in words.
 */
import type { LimitMethod } from "@/lib/limits";
import { BLIND_TEXT, RATE_UNIT, limitTag, muInterval, rateText, type LimitView } from "@/lib/limits-view";

function Tag({ method, cl, block = false }: { method: LimitMethod; cl: number; block?: boolean }) {
  if (block) return <span className="block whitespace-nowrap text-xs text-muted">{limitTag(method, cl)}</span>;
  return <span className="whitespace-nowrap text-muted"> · {limitTag(method, cl)}</span>;
}

/** The blind notice, icon + words, spanning the count and limit columns. */
export function BlindCell({ span }: { span: number }) {
  return (
    <td colSpan={span} className="px-2 py-1.5" data-testid="blind-notice">
      <span className="inline-flex items-center gap-1.5 text-accent">
        <span aria-hidden>◐</span>
        {BLIND_TEXT}
      </span>
    </td>
  );
}

/** The two limit cells (μ interval; rate per kg·day above rate per t·yr) of a non-blind view. */
export function LimitCells({ view, method, cl, awaitingText }: { view: LimitView; method: LimitMethod; cl: number; awaitingText: string }) {
  if (view.state === "blind") return <BlindCell span={2} />;
  if (view.state === "awaiting") {
    return (
      <td colSpan={2} className="px-2 py-1.5 text-muted" data-testid="limit-awaiting">
        <span aria-hidden>○ </span>
        {awaitingText}
      </td>
    );
  }
  if (view.state === "refused") {
    return (
      <td colSpan={2} className="px-2 py-1.5" data-testid="limit-refused">
        <span className="text-warn"><span aria-hidden>⚠ </span>Cannot compute: {view.field} {view.reason}</span>
        <Tag method={method} cl={cl} />
      </td>
    );
  }
  const { result, rate, rateNote } = view;
  if (result.upper === null) {
    return (
      <td colSpan={2} className="px-2 py-1.5" data-testid="limit-no-limit">
        <span className="text-warn"><span aria-hidden>⚠ </span>No limit: </span>
        {result.note}
        <Tag method={method} cl={cl} />
      </td>
    );
  }
  return (
    <>
      <td className="px-2 py-1.5" data-testid="mu-interval" data-lower={result.lower} data-upper={result.upper}>
        <span className="whitespace-nowrap">{muInterval(result.lower, result.upper)}</span>
        {result.kind === "interval" && <span className="text-muted"> (two-sided)</span>}
        <span className="sr-only"> · </span>
        <Tag method={method} cl={cl} block />
      </td>
      {rate ? (
        <td className="px-2 py-1.5">
          <span className="block" data-testid="rate-kgday" data-value={rate.upperPerKgDay}>
            <span className="whitespace-nowrap">{rateText(rate.lowerPerKgDay, rate.upperPerKgDay, RATE_UNIT.perKgDay)}</span>
            <Tag method={method} cl={cl} />
          </span>
          <span className="block" data-testid="rate-tyr" data-value={rate.upperPerTonneYear}>
            <span className="whitespace-nowrap">{rateText(rate.lowerPerTonneYear, rate.upperPerTonneYear, RATE_UNIT.perTonneYear)}</span>
            <Tag method={method} cl={cl} />
          </span>
        </td>
      ) : (
        <td className="px-2 py-1.5 text-muted" data-testid="rate-missing">
          <span aria-hidden>○ </span>
          {rateNote}
        </td>
      )}
    </>
  );
}
