"use client";
/** Add a detector configuration (detector experts); same checks as POST /api/configs. */
import { useActionState } from "react";
import { DETECTORS } from "@/lib/runs/types";
import { createConfigAction, type RunFormState } from "../actions";
import { Field, Outcome, inputClass } from "../FormBits";

/** Detector, name, target material, fiducial mass, effective time (UTC), notes. */
export function ConfigForm({ nowUtc }: { nowUtc: string }) {
  const [state, action, pending] = useActionState<RunFormState, FormData>(createConfigAction, {});
  const v = state.values ?? {};
  const invalid = (name: string) => (state.field === name ? true : undefined);
  return (
    <form key={state.attempt ?? 0} action={action} aria-label="Add a configuration" className="grid gap-3 md:grid-cols-3">
      <div className="md:col-span-3"><Outcome state={state} /></div>
      <Field label="Detector" name="detector" state={state}>
        <select name="detector" defaultValue={v.detector ?? DETECTORS[0]} aria-invalid={invalid("detector")} className={inputClass}>
          {DETECTORS.map((d) => (
            <option key={d} value={d}>{d}</option>
          ))}
        </select>
      </Field>
      <Field label="Name" name="name" state={state}>
        <input name="name" required defaultValue={v.name ?? ""} aria-invalid={invalid("name")} className={inputClass} />
      </Field>
      <Field label="Target material" name="targetMaterial" state={state}>
        <input name="targetMaterial" required defaultValue={v.targetMaterial ?? ""} placeholder="xenon" aria-invalid={invalid("targetMaterial")} className={inputClass} />
      </Field>
      <Field label="Fiducial mass (kg)" name="fiducialMassKg" state={state} hint="Exact decimal, up to 4 places (e.g. 948.5).">
        <input name="fiducialMassKg" inputMode="decimal" required defaultValue={v.fiducialMassKg ?? ""} aria-invalid={invalid("fiducialMassKg")} className={inputClass} />
      </Field>
      <Field label="Effective from (UTC)" name="effectiveFrom" state={state} hint="Runs starting at or after this take it, until the next configuration.">
        <input name="effectiveFrom" type="datetime-local" step={1} required defaultValue={v.effectiveFrom ?? nowUtc} aria-invalid={invalid("effectiveFrom")} className={inputClass} />
      </Field>
      <Field label="Notes (optional)" name="notes" state={state}>
        <input name="notes" defaultValue={v.notes ?? ""} aria-invalid={invalid("notes")} className={inputClass} />
      </Field>
      <div className="md:col-span-3">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 text-sm font-medium text-ground disabled:opacity-60">
          {pending ? "Adding…" : "Add configuration"}
        </button>
      </div>
    </form>
  );
}
