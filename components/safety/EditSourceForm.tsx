"use client";
import { useActionState } from "react";
import { updateSourceAction, type FormState } from "@/app/(app)/safety/actions";

const input = "mt-1 block w-full rounded border border-line bg-raised px-2 py-1.5";

export type EditableSource = {
  id: number;
  form: "sealed" | "gaseous";
  location: string;
  custodianId: number | null;
  allowedOutHours: number;
  leakTestIntervalMonths: number | null;
  decayWaitFraction: number | null;
  notes: string | null;
};

/** Change where a source is kept, who looks after it, its allowed time out, its intervals and notes (safety officers). */
export function EditSourceForm({ source, custodians }: { source: EditableSource; custodians: { id: number; displayName: string }[] }) {
  const [state, action, pending] = useActionState<FormState, FormData>(updateSourceAction, {});
  return (
    <form action={action} className="grid gap-3 rounded-lg border border-line bg-panel p-4 sm:grid-cols-2 lg:grid-cols-5" aria-label="Edit this source">
      <input type="hidden" name="sourceId" value={source.id} />
      <label className="block text-sm">
        <span className="text-xs text-muted">Location</span>
        <input name="location" defaultValue={source.location} required className={input} />
      </label>
      <label className="block text-sm">
        <span className="text-xs text-muted">Custodian</span>
        <select name="custodianId" defaultValue={source.custodianId ?? ""} className={input}>
          <option value="">none named</option>
          {custodians.map((c) => <option key={c.id} value={c.id}>{c.displayName}</option>)}
        </select>
      </label>
      <label className="block text-sm">
        <span className="text-xs text-muted">Allowed time out (h)</span>
        <input name="allowedOutHours" defaultValue={source.allowedOutHours} inputMode="decimal" className={input} />
      </label>
      {source.form === "sealed" ? (
        <label className="block text-sm">
          <span className="text-xs text-muted">Leak-test interval (months)</span>
          <input name="leakTestIntervalMonths" defaultValue={source.leakTestIntervalMonths ?? ""} inputMode="numeric" className={input} />
        </label>
      ) : (
        <label className="block text-sm">
          <span className="text-xs text-muted">Decay-wait fraction</span>
          <input name="decayWaitFraction" defaultValue={source.decayWaitFraction ?? ""} inputMode="decimal" className={input} />
        </label>
      )}
      <label className="block text-sm">
        <span className="text-xs text-muted">Notes</span>
        <input name="notes" defaultValue={source.notes ?? ""} className={input} />
      </label>
      <div className="flex items-center gap-3 sm:col-span-2 lg:col-span-5">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">{pending ? "Saving…" : "Save changes"}</button>
        {state.error && <p role="alert" className="text-sm text-bad">⚠ {state.field ? `${state.field}: ` : ""}{state.error}</p>}
        {state.done && !state.error && <p role="status" className="text-sm text-good">✓ {state.done}</p>}
      </div>
    </form>
  );
}
