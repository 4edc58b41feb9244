"use client";
import { useActionState } from "react";
import { RUN_TYPES } from "@/db/schema/runs";
import { DETECTORS } from "@/lib/runs/types";
import { submitKeepingInput } from "@/components/quality/keep-form";
import { createPeriodAction, updatePeriodAction, type PeriodFormState } from "./actions";

export type PeriodDefaults = {
  id?: number;
  name: string;
  startAt: string;
  endAt: string;
  runTypes: string[];
  /** "" counts every detector. */
  detector: string;
  signalAcceptance: string;
  notes: string;
  blind: boolean;
};

const field = "mt-1 w-full rounded border border-line bg-raised px-2 py-1.5";

/** Create or edit a data-quality period (times typed as UTC). */
export function PeriodForm({ defaults }: { defaults: PeriodDefaults }) {
  const editing = defaults.id !== undefined;
  const [state, action, pending] = useActionState<PeriodFormState, FormData>(editing ? updatePeriodAction : createPeriodAction, {});
  const blindLocked = editing && defaults.blind;
  return (
    <form onSubmit={submitKeepingInput(action)} className="grid max-w-3xl gap-3 rounded-lg border border-line bg-panel p-4 md:grid-cols-2" aria-label={editing ? "Edit period" : "New period"}>
      {editing && <input type="hidden" name="id" value={defaults.id} />}
      <label className="block md:col-span-2">
        <span className="text-xs text-muted">Name</span>
        <input name="name" required defaultValue={defaults.name} className={field} />
      </label>
      <label className="block">
        <span className="text-xs text-muted">Start (UTC)</span>
        <input name="startAt" required defaultValue={defaults.startAt} placeholder="2032-01-01 00:00" className={`${field} tabular`} />
      </label>
      <label className="block">
        <span className="text-xs text-muted">End (UTC)</span>
        <input name="endAt" required defaultValue={defaults.endAt} placeholder="2032-02-01 00:00" className={`${field} tabular`} />
      </label>
      <fieldset className="md:col-span-2">
        <legend className="text-xs text-muted">Run types that count</legend>
        <div className="mt-1 flex flex-wrap gap-4 text-sm">
          {RUN_TYPES.map((t) => (
            <label key={t} className="flex items-center gap-1.5">
              <input type="checkbox" name="runTypes" value={t} defaultChecked={defaults.runTypes.includes(t)} /> {t}
            </label>
          ))}
        </div>
      </fieldset>
      <label className="block">
        <span className="text-xs text-muted">Detector whose runs count</span>
        <select name="detector" defaultValue={defaults.detector} className={field}>
          {/* A stored detector outside the usual list stays selectable, so editing never changes it silently. */}
          {[...new Set([...DETECTORS, defaults.detector].filter(Boolean))].map((d) => (
            <option key={d} value={d}>{d}</option>
          ))}
          <option value="">every detector (their target masses add up)</option>
        </select>
      </label>
      <label className="block">
        <span className="text-xs text-muted">Signal acceptance (0–1)</span>
        <input name="signalAcceptance" type="number" step="any" min={0} max={1} required defaultValue={defaults.signalAcceptance} className={`${field} tabular`} />
      </label>
      <div className="block">
        <label className="mt-5 flex items-center gap-2 text-sm">
          <input type="checkbox" name="blind" defaultChecked={defaults.blind} disabled={blindLocked} /> Blind analysis (observed counts hidden until unblinding)
        </label>
        {blindLocked && (
          <>
            <input type="hidden" name="blindLocked" value="true" />
            <p className="text-xs text-muted">This period is blind; it is unblinded by recording the unblinding on its limits page.</p>
          </>
        )}
      </div>
      <label className="block md:col-span-2">
        <span className="text-xs text-muted">Notes</span>
        <textarea name="notes" rows={3} defaultValue={defaults.notes} className={field} />
      </label>
      <div className="flex items-center gap-3 md:col-span-2">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">
          {pending ? "Saving…" : editing ? "Save period" : "Create period"}
        </button>
        {state.error && <p role="alert" className="text-sm text-bad">⚠ {state.error}</p>}
      </div>
    </form>
  );
}
