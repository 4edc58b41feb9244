"use client";
import { useActionState, useState } from "react";
import { createSourceAction, type FormState } from "@/app/(app)/safety/actions";

type NuclideChoice = { id: string; name: string; form: "sealed" | "gaseous" };

const input = "mt-1 block w-full rounded border border-line bg-raised px-2 py-1.5";

function Field({ label, name, state, children }: { label: string; name: string; state: FormState; children: React.ReactNode }) {
  return (
    <label className="block text-sm">
      <span className="text-xs text-muted">{label}</span>
      {children}
      {state.field === name && <span role="alert" className="mt-0.5 block text-xs text-bad">⚠ {state.error}</span>}
    </label>
  );
}

/** Add a source to the inventory from its certificate (safety officers). */
export function NewSourceForm({ nuclides, custodians }: { nuclides: NuclideChoice[]; custodians: { id: number; displayName: string }[] }) {
  const [state, action, pending] = useActionState<FormState, FormData>(createSourceAction, {});
  const [nuclide, setNuclide] = useState(nuclides[0]?.id ?? "");
  const [form, setForm] = useState<"sealed" | "gaseous">(nuclides[0]?.form ?? "sealed");
  return (
    <form action={action} className="mt-6 rounded-lg border border-line bg-panel p-4" aria-label="Add a calibration source">
      <h2 className="mb-3 font-semibold">Add a source</h2>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Nuclide" name="nuclide" state={state}>
          <select
            name="nuclide"
            value={nuclide}
            onChange={(e) => {
              setNuclide(e.target.value);
              setForm(nuclides.find((n) => n.id === e.target.value)?.form ?? "sealed");
            }}
            className={input}
          >
            {nuclides.map((n) => <option key={n.id} value={n.id}>{n.id} ({n.name})</option>)}
          </select>
        </Field>
        <Field label="Serial" name="serial" state={state}><input name="serial" required className={input} /></Field>
        <Field label="Form" name="form" state={state}>
          <select name="form" value={form} onChange={(e) => setForm(e.target.value as "sealed" | "gaseous")} className={input}>
            <option value="sealed">sealed</option>
            <option value="gaseous">gaseous (injected)</option>
          </select>
        </Field>
        <Field label="Reference activity (Bq)" name="referenceActivityBq" state={state}>
          <input name="referenceActivityBq" inputMode="decimal" required placeholder="e.g. 370000" className={input} />
        </Field>
        <Field label="Reference date (UTC)" name="referenceDate" state={state}><input name="referenceDate" type="date" required className={input} /></Field>
        <Field label="Location" name="location" state={state}><input name="location" required placeholder="e.g. source safe, Hall B" className={input} /></Field>
        <Field label="Custodian" name="custodianId" state={state}>
          <select name="custodianId" defaultValue="" className={input}>
            <option value="">none named</option>
            {custodians.map((c) => <option key={c.id} value={c.id}>{c.displayName}</option>)}
          </select>
        </Field>
        <Field label="Allowed time out (h)" name="allowedOutHours" state={state}>
          <input name="allowedOutHours" inputMode="decimal" required defaultValue="8" className={input} />
        </Field>
        {form === "sealed" ? (
          <>
            <Field label="Leak-test interval (months)" name="leakTestIntervalMonths" state={state}>
              <input name="leakTestIntervalMonths" inputMode="numeric" defaultValue="6" className={input} />
            </Field>
            <Field label="Last leak test (UTC)" name="lastLeakTestAt" state={state}><input name="lastLeakTestAt" type="date" className={input} /></Field>
          </>
        ) : (
          <Field label="Decay-wait fraction (of injected activity)" name="decayWaitFraction" state={state}>
            <input name="decayWaitFraction" inputMode="decimal" defaultValue="0.001" className={input} />
          </Field>
        )}
        <Field label="Notes" name="notes" state={state}><input name="notes" className={input} /></Field>
      </div>
      <div className="mt-3 flex items-center gap-3">
        <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">
          {pending ? "Adding…" : "Add source"}
        </button>
        {state.error && !state.field && <p role="alert" className="text-sm text-bad">⚠ {state.error}</p>}
        {state.done && <p role="status" className="text-sm text-good">✓ {state.done}</p>}
      </div>
    </form>
  );
}
