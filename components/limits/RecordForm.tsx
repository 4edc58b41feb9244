"use client";
/**
 * The convener's form: a period's observed count n (not while it is blind), its expected background b with a
 * note on where b comes from, and the CL and method the period is quoted with. The signal acceptance is shown,
 * not edited: it belongs to the period's definition on the exposure pages.
 */
import { useActionState } from "react";
import Link from "next/link";
import { LIMIT_METHODS } from "@/lib/limits";
import { METHOD_LONG, acceptanceText } from "@/lib/limits-view";
import type { LimitRow } from "./rows";

/** What the server action answers. */
export type RecordState = { error?: string; field?: string; saved?: string };
/** The server action the page passes in. */
export type RecordAction = (prev: RecordState, form: FormData) => Promise<RecordState>;

const input = "mt-1 block w-full rounded border border-line bg-raised px-2 py-1.5 text-sm text-ink";

/** The recording form for the period `selectedId`; the period select switches it. */
export function RecordForm({ rows, selectedId, onSelect, action }: { rows: LimitRow[]; selectedId: number; onSelect: (id: number) => void; action: RecordAction }) {
  const [state, submit, pending] = useActionState<RecordState, FormData>(action, {});
  const row = rows.find((r) => r.id === selectedId) ?? rows[0];
  if (!row) return null;
  return (
    <form action={submit} aria-label="Record count and background" className="grid gap-3 rounded-lg border border-line bg-panel p-4 md:grid-cols-3" id="record-form">
      <h2 className="text-base font-semibold md:col-span-3">Record count and background</h2>
      <label className="text-xs text-muted">
        Period
        <select name="periodId" value={row.id} onChange={(e) => onSelect(Number(e.target.value))} className={input}>
          {rows.map((r) => <option key={r.id} value={r.id}>{r.name}{r.blind ? " (blind)" : ""}</option>)}
        </select>
      </label>
      <div key={`${row.id}-count`}>
        <label className="text-xs text-muted">
          Observed count n (events)
          <input
            name="observed"
            type="number"
            min={0}
            step={1}
            disabled={row.blind}
            defaultValue={row.blind || row.observed === null ? "" : row.observed}
            aria-describedby={row.blind ? "count-blind" : undefined}
            className={`${input} disabled:opacity-60`}
          />
        </label>
        {row.blind && (
          <p id="count-blind" className="mt-1 text-xs text-accent">
            <span aria-hidden>◐ </span>Blind — n can be recorded only after the unblinding is recorded.
          </p>
        )}
      </div>
      <p className="text-xs text-muted">
        Signal acceptance
        <span className="mt-1 block py-1.5 text-sm text-ink">
          {acceptanceText(row.acceptance)} <Link href={`/exposure/${row.id}`} className="text-xs text-accent hover:underline">set on the period</Link>
        </span>
      </p>
      <label className="text-xs text-muted" key={`${row.id}-b`}>
        Expected background b (events)
        <input name="background" inputMode="decimal" defaultValue={row.background ?? ""} className={input} />
      </label>
      <label className="text-xs text-muted md:col-span-2" key={`${row.id}-note`}>
        Where the background comes from
        <textarea name="backgroundNote" rows={2} defaultValue={row.backgroundNote ?? ""} className={input} placeholder="e.g. radiogenic neutrons + ER leakage, from the background model" />
      </label>
      <label className="text-xs text-muted" key={`${row.id}-cl`}>
        Quoted confidence level (%)
        <input name="clPercent" inputMode="decimal" list="cl-percent-choices" defaultValue={String(Number((row.quotedCl * 100).toFixed(6)))} className={input} />
        <datalist id="cl-percent-choices">
          {["90", "95", "68.27", "99"].map((v) => <option key={v} value={v} />)}
        </datalist>
      </label>
      <label className="text-xs text-muted" key={`${row.id}-method`}>
        Quoted method
        <select name="method" defaultValue={row.quotedMethod} className={input}>
          {LIMIT_METHODS.map((m) => <option key={m} value={m}>{METHOD_LONG[m]}</option>)}
        </select>
      </label>
      <div className="flex items-end gap-3">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 text-sm font-medium text-ground disabled:opacity-60">
          {pending ? "Recording…" : "Record"}
        </button>
      </div>
      {state.error && <p role="alert" className="text-sm text-bad md:col-span-3"><span aria-hidden>⚠ </span>{state.error}</p>}
      {state.saved && !pending && <p role="status" className="text-sm text-good md:col-span-3"><span aria-hidden>✓ </span>{state.saved}</p>}
    </form>
  );
}
