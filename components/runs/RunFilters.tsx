"use client";
/** The runs list's filter bar: type, status and a UTC date range (both days included). */
import { RUN_STATUSES, RUN_TYPES } from "@/lib/runs/types";

export type RunFilterValues = { type: string; status: string; from: string; to: string };
export const NO_FILTERS: RunFilterValues = { type: "", status: "", from: "", to: "" };

const DAY_MS = 86_400_000;

/** The API query for the filters: `to` is the day after the last day chosen, since the API's bound is exclusive. */
export function filterParams(f: RunFilterValues): URLSearchParams {
  const p = new URLSearchParams();
  if (f.type) p.set("type", f.type);
  if (f.status) p.set("status", f.status);
  if (f.from) p.set("from", f.from);
  if (f.to) {
    const next = Date.parse(`${f.to}T00:00:00Z`) + DAY_MS;
    if (Number.isFinite(next)) p.set("to", new Date(next).toISOString());
  }
  return p;
}

const field = "mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm";

/** Filter controls; every change is reported at once. */
export function RunFilters({ value, onChange }: { value: RunFilterValues; onChange: (v: RunFilterValues) => void }) {
  const set = (k: keyof RunFilterValues) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => onChange({ ...value, [k]: e.target.value });
  const active = value.type || value.status || value.from || value.to;
  return (
    <form role="search" aria-label="Filter runs" className="flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()}>
      <label className="text-xs text-muted">
        Type
        <select value={value.type} onChange={set("type")} className={field}>
          <option value="">all types</option>
          {RUN_TYPES.map((t) => (
            <option key={t} value={t}>{t}</option>
          ))}
        </select>
      </label>
      <label className="text-xs text-muted">
        Status
        <select value={value.status} onChange={set("status")} className={field}>
          <option value="">any status</option>
          {RUN_STATUSES.map((s) => (
            <option key={s} value={s}>{s}</option>
          ))}
        </select>
      </label>
      <label className="text-xs text-muted">
        Started from (UTC day)
        <input type="date" value={value.from} onChange={set("from")} className={field} />
      </label>
      <label className="text-xs text-muted">
        Started up to (UTC day, included)
        <input type="date" value={value.to} onChange={set("to")} className={field} />
      </label>
      {active && (
        <button type="button" onClick={() => onChange(NO_FILTERS)} className="rounded border border-line px-2 py-1 text-sm hover:bg-raised">
          Clear filters
        </button>
      )}
    </form>
  );
}
