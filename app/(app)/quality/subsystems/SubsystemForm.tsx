"use client";
import { useActionState, useRef } from "react";
import { submitKeepingInput } from "@/components/quality/keep-form";
import { createSubsystemAction, type FormState } from "../actions";

/** Add a subsystem that flags can name. */
export function SubsystemForm() {
  const formRef = useRef<HTMLFormElement>(null);
  const [state, action, pending] = useActionState<FormState, FormData>(async (prev, form) => {
    const result = await createSubsystemAction(prev, form);
    if (result.done) formRef.current?.reset();
    return result;
  }, {});
  return (
    <form ref={formRef} onSubmit={submitKeepingInput(action)} className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-4" aria-label="Add a subsystem">
      <label className="block">
        <span className="text-xs text-muted">Name</span>
        <input name="label" required placeholder="e.g. Purification loop" className="mt-1 block rounded border border-line bg-raised px-2 py-1.5" />
      </label>
      <label className="block">
        <span className="text-xs text-muted">Code (lower-case, dashes)</span>
        <input name="code" required placeholder="purification" className="mt-1 block rounded border border-line bg-raised px-2 py-1.5 font-mono" />
      </label>
      <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">{pending ? "Adding…" : "Add subsystem"}</button>
      {state.error && <p role="alert" className="w-full text-sm text-bad">⚠ {state.error}</p>}
      {state.done && <p role="status" className="w-full text-sm text-good">✓ {state.done}</p>}
    </form>
  );
}
