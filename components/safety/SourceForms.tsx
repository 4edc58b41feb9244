"use client";
import { useActionState } from "react";
import { checkoutAction, leakTestAction, returnAction, setRunsAction, type FormState } from "@/app/(app)/safety/actions";

const input = "mt-1 block w-full rounded border border-line bg-raised px-2 py-1.5";
const button = "rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60";

function Result({ state }: { state: FormState }) {
  if (state.error) return <p role="alert" className="text-sm text-bad">⚠ {state.field ? `${state.field}: ` : ""}{state.error}</p>;
  if (state.done) return <p role="status" className="text-sm text-good">✓ {state.done}</p>;
  return null;
}

/** Check the source out for a calibration, now or at an earlier time (recorded afterwards). */
export function CheckoutForm({ sourceId }: { sourceId: number }) {
  const [state, action, pending] = useActionState<FormState, FormData>(checkoutAction, {});
  return (
    <form action={action} className="grid gap-3 rounded-lg border border-line bg-panel p-4 sm:grid-cols-2 lg:grid-cols-4" aria-label="Check out this source">
      <input type="hidden" name="sourceId" value={sourceId} />
      <label className="block text-sm lg:col-span-2">
        <span className="text-xs text-muted">Purpose</span>
        <input name="purpose" required placeholder="e.g. weekly Cs-137 calibration at the cryostat" className={input} />
      </label>
      <label className="block text-sm">
        <span className="text-xs text-muted">Checked out at (UTC; empty = now)</span>
        <input name="checkedOutAt" type="datetime-local" className={input} />
      </label>
      <label className="block text-sm">
        <span className="text-xs text-muted">Calibration runs served (numbers)</span>
        <input name="runNumbers" placeholder="e.g. 1042, 1043" className={input} />
      </label>
      <div className="flex items-center gap-3 sm:col-span-2 lg:col-span-4">
        <button type="submit" disabled={pending} className={button}>{pending ? "Saving…" : "Check out"}</button>
        <Result state={state} />
      </div>
    </form>
  );
}

/** Return the checked-out source (now, or at the time it actually came back). */
export function ReturnForm({ sourceId, checkoutId }: { sourceId: number; checkoutId: number }) {
  const [state, action, pending] = useActionState<FormState, FormData>(returnAction, {});
  return (
    <form action={action} className="flex flex-wrap items-end gap-3" aria-label="Return this source">
      <input type="hidden" name="sourceId" value={sourceId} />
      <input type="hidden" name="checkoutId" value={checkoutId} />
      <label className="block text-sm">
        <span className="text-xs text-muted">Returned at (UTC; empty = now)</span>
        <input name="returnedAt" type="datetime-local" className={input} />
      </label>
      <button type="submit" disabled={pending} className={button}>{pending ? "Saving…" : "Return to store"}</button>
      <Result state={state} />
    </form>
  );
}

/** Change which calibration runs a checkout served. */
export function RunsForm({ sourceId, checkoutId, runNumbers }: { sourceId: number; checkoutId: number; runNumbers: number[] }) {
  const [state, action, pending] = useActionState<FormState, FormData>(setRunsAction, {});
  return (
    <form action={action} className="flex items-end gap-2" aria-label={`Runs of checkout ${checkoutId}`}>
      <input type="hidden" name="sourceId" value={sourceId} />
      <input type="hidden" name="checkoutId" value={checkoutId} />
      <label className="block text-xs">
        <span className="sr-only">Runs served by checkout {checkoutId}</span>
        <input name="runNumbers" defaultValue={runNumbers.join(", ")} placeholder="run numbers" className="block w-40 rounded border border-line bg-raised px-1.5 py-0.5" />
      </label>
      <button type="submit" disabled={pending} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-raised">Link</button>
      <Result state={state} />
    </form>
  );
}

/** Record a leak (wipe) test of a sealed source. */
export function LeakTestForm({ sourceId }: { sourceId: number }) {
  const [state, action, pending] = useActionState<FormState, FormData>(leakTestAction, {});
  return (
    <form action={action} className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-4" aria-label="Record a leak test">
      <input type="hidden" name="sourceId" value={sourceId} />
      <label className="block text-sm">
        <span className="text-xs text-muted">Leak test date (UTC)</span>
        <input name="testedAt" type="date" required className={input} />
      </label>
      <label className="block text-sm">
        <span className="text-xs text-muted">Result</span>
        <input name="result" defaultValue="passed" className={input} />
      </label>
      <button type="submit" disabled={pending} className={button}>{pending ? "Saving…" : "Record leak test"}</button>
      <Result state={state} />
    </form>
  );
}
