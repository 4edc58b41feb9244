"use client";
/** The shift crew's "open a run" form; it goes through the same checks as the DAQ's POST /api/runs. */
import { useActionState } from "react";
import { DETECTORS, RUN_TYPES } from "@/lib/runs/types";
import { openRunAction, type RunFormState } from "./actions";
import { Field, Outcome, inputClass } from "./FormBits";

const CONDITIONS_HINT = "drift field [kV/cm] = 0.23\ncathode voltage [kV] = -16.1\nliquid temperature [K] = 175.8\ngas pressure [bar] = 1.92";

/** Open a run: number, type, start (UTC), detector, optional mass override, conditions. */
export function OpenRunForm({ suggestedNumber, nowUtc }: { suggestedNumber: number; nowUtc: string }) {
  const [state, action, pending] = useActionState<RunFormState, FormData>(openRunAction, {});
  const v = state.values ?? {};
  const invalid = (name: string) => (state.field === name ? true : undefined);
  return (
    <form key={state.attempt ?? 0} action={action} aria-label="Open a run" className="grid gap-3 md:grid-cols-3">
      <div className="md:col-span-3"><Outcome state={state} /></div>
      <Field label="Run number" name="number" state={state}>
        <input name="number" inputMode="numeric" required defaultValue={v.number ?? String(suggestedNumber)} aria-invalid={invalid("number")} className={inputClass} />
      </Field>
      <Field label="Type" name="type" state={state}>
        <select name="type" defaultValue={v.type ?? "science"} aria-invalid={invalid("type")} className={inputClass}>
          {RUN_TYPES.map((t) => (
            <option key={t} value={t}>{t}</option>
          ))}
        </select>
      </Field>
      <Field label="Start (UTC)" name="start" state={state}>
        <input name="start" type="datetime-local" step={1} required defaultValue={v.start ?? nowUtc} aria-invalid={invalid("start")} className={inputClass} />
      </Field>
      <Field label="Detector" name="detector" state={state}>
        <select name="detector" defaultValue={v.detector ?? DETECTORS[0]} aria-invalid={invalid("detector")} className={inputClass}>
          {DETECTORS.map((d) => (
            <option key={d} value={d}>{d}</option>
          ))}
        </select>
      </Field>
      <Field label="Target-mass override (kg, optional)" name="targetMassOverrideKg" state={state} hint="Leave empty to use the configuration in force at the start.">
        <input name="targetMassOverrideKg" inputMode="decimal" defaultValue={v.targetMassOverrideKg ?? ""} aria-invalid={invalid("targetMassOverrideKg")} className={inputClass} />
      </Field>
      <div className="md:row-span-2">
        <Field label="Conditions (one per line: name = value)" name="conditions" state={state}>
          <textarea name="conditions" rows={5} defaultValue={v.conditions ?? ""} placeholder={CONDITIONS_HINT} aria-invalid={invalid("conditions")} className={`${inputClass} font-mono`} />
        </Field>
      </div>
      <div className="flex items-end md:col-span-2">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 text-sm font-medium text-ground disabled:opacity-60">
          {pending ? "Opening…" : "Open run"}
        </button>
      </div>
    </form>
  );
}
