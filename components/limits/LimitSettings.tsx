"use client";
/**
 * The method and confidence-level selectors of the limits page. A typed CL is read as a percentage; while it
 * does not parse, the last good CL stays in force and the reason is shown beside the field.
 */
import { useState } from "react";
import { LIMIT_METHODS, LimitInputError, type LimitMethod } from "@/lib/limits";
import { CL_CHOICES, METHOD_LONG, clLabel, isClChoice, parseClPercent } from "@/lib/limits-view";

const TYPED = "typed";

/** Method select, CL select with the usual levels and "type another", and the typed-CL field. */
export function LimitSettings({ method, cl, onMethod, onCl }: { method: LimitMethod; cl: number; onMethod: (m: LimitMethod) => void; onCl: (cl: number) => void }) {
  const [typing, setTyping] = useState(!isClChoice(cl));
  const [text, setText] = useState(isClChoice(cl) ? "" : String(Number((cl * 100).toFixed(6))));
  const [problem, setProblem] = useState<string | null>(null);

  function typed(value: string) {
    setText(value);
    try {
      onCl(parseClPercent(value));
      setProblem(null);
    } catch (err) {
      if (!(err instanceof LimitInputError)) throw err;
      setProblem(err.reason);
    }
  }

  return (
    <div role="group" aria-label="Limit settings" className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-3">
      <label className="text-xs text-muted">
        Method
        <select
          value={method}
          onChange={(e) => onMethod(e.target.value as LimitMethod)}
          className="mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm text-ink"
        >
          {LIMIT_METHODS.map((m) => <option key={m} value={m}>{METHOD_LONG[m]}</option>)}
        </select>
      </label>
      <label className="text-xs text-muted">
        Confidence level
        <select
          value={typing ? TYPED : String(CL_CHOICES.find((c) => Math.abs(c - cl) < 1e-9) ?? TYPED)}
          onChange={(e) => {
            if (e.target.value === TYPED) {
              setTyping(true);
              setText(String(Number((cl * 100).toFixed(6))));
              return;
            }
            setTyping(false);
            setProblem(null);
            onCl(Number(e.target.value));
          }}
          className="mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm text-ink"
        >
          {CL_CHOICES.map((c) => <option key={c} value={String(c)}>{clLabel(c)}</option>)}
          <option value={TYPED}>Type another…</option>
        </select>
      </label>
      {typing && (
        <label className="text-xs text-muted">
          Typed CL (%)
          <input
            value={text}
            onChange={(e) => typed(e.target.value)}
            inputMode="decimal"
            aria-invalid={problem !== null}
            aria-describedby={problem ? "typed-cl-problem" : undefined}
            className="mt-1 block w-24 rounded border border-line bg-raised px-2 py-1 text-sm text-ink"
          />
        </label>
      )}
      {problem && (
        <p id="typed-cl-problem" role="alert" className="text-sm text-bad">
          <span aria-hidden>⚠ </span>{problem}; still showing {clLabel(cl)}.
        </p>
      )}
      <p className="ml-auto self-center text-xs text-muted">Computed in your browser with the same code the API uses.</p>
    </div>
  );
}
