"use client";
/** Close a running run by hand; the same checks as the DAQ's PATCH /api/runs/{number}. */
import { useActionState } from "react";
import { ACCOUNTING_TOLERANCE_TEXT } from "@/lib/runs/rules";
import { closeRunAction, type RunFormState } from "../actions";
import { Field, Outcome, inputClass } from "../FormBits";

/** End (UTC), live and dead time, trigger count and how the run ended. */
export function CloseRunForm({ number, nowUtc, elapsedSeconds }: { number: number; nowUtc: string; elapsedSeconds: number }) {
  const [state, action, pending] = useActionState<RunFormState, FormData>(closeRunAction, {});
  const v = state.values ?? {};
  const invalid = (name: string) => (state.field === name ? true : undefined);
  return (
    <form key={state.attempt ?? 0} action={action} aria-label="Close this run" className="grid gap-3 md:grid-cols-5">
      <input type="hidden" name="runNumber" value={number} />
      <div className="md:col-span-5"><Outcome state={state} /></div>
      <Field label="End (UTC)" name="end" state={state}>
        <input name="end" type="datetime-local" step={1} required defaultValue={v.end ?? nowUtc} aria-invalid={invalid("end")} className={inputClass} />
      </Field>
      <Field label="Live time (s)" name="liveSeconds" state={state} hint={`Running for ${Math.round(elapsedSeconds)} s so far.`}>
        <input name="liveSeconds" inputMode="decimal" required defaultValue={v.liveSeconds ?? ""} aria-invalid={invalid("liveSeconds")} className={inputClass} />
      </Field>
      <Field label="Dead time (s)" name="deadSeconds" state={state} hint={`Live + dead may exceed the duration by ${ACCOUNTING_TOLERANCE_TEXT}.`}>
        <input name="deadSeconds" inputMode="decimal" required defaultValue={v.deadSeconds ?? ""} aria-invalid={invalid("deadSeconds")} className={inputClass} />
      </Field>
      <Field label="Trigger count" name="triggerCount" state={state}>
        <input name="triggerCount" inputMode="numeric" required defaultValue={v.triggerCount ?? ""} aria-invalid={invalid("triggerCount")} className={inputClass} />
      </Field>
      <Field label="Outcome" name="status" state={state}>
        <select name="status" defaultValue={v.status ?? "ended"} aria-invalid={invalid("status")} className={inputClass}>
          <option value="ended">ended normally</option>
          <option value="aborted">aborted</option>
        </select>
      </Field>
      <div className="md:col-span-5">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 text-sm font-medium text-ground disabled:opacity-60">
          {pending ? "Closing…" : "Close run"}
        </button>
      </div>
    </form>
  );
}
