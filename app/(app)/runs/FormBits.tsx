/** Small shared pieces of the run forms: a labelled field and the outcome line. */
import type { RunFormState } from "./actions";

export const inputClass = "mt-1 block w-full rounded border border-line bg-raised px-2 py-1 text-sm aria-[invalid=true]:border-bad";

/** A label wrapping its control, with the error shown under it when the server named this field. */
export function Field({ label, name, state, children, hint }: { label: string; name: string; state: RunFormState; children: React.ReactNode; hint?: string }) {
  const wrong = state.field === name;
  return (
    <label className="block text-xs text-muted">
      {label}
      {children}
      {hint && !wrong && <span className="mt-0.5 block text-[11px]">{hint}</span>}
      {wrong && <span className="mt-0.5 block text-bad">⚠ {state.error}</span>}
    </label>
  );
}

/** The outcome of the last submission: an error not tied to a field shown above, or what was done. */
export function Outcome({ state }: { state: RunFormState }) {
  if (state.error && !state.field) return <p role="alert" className="text-sm text-bad">⚠ {state.error}</p>;
  if (state.error) return <p role="alert" className="text-sm text-bad">⚠ Not saved: see the field marked below.</p>;
  if (state.done) return <p role="status" className="text-sm text-good">✓ {state.done}</p>;
  return null;
}
