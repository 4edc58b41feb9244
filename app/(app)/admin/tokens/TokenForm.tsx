"use client";
import { useActionState } from "react";
import { createTokenAction, type TokenState } from "../actions";

/** Create a DAQ token; the value is shown once, here. */
export function TokenForm() {
  const [state, action, pending] = useActionState<TokenState, FormData>(createTokenAction, {});
  return (
    <form action={action} className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-4">
      <label className="block">
        <span className="text-xs text-muted">Token name</span>
        <input name="name" required placeholder="e.g. daq-host-1" className="mt-1 block rounded border border-line bg-raised px-2 py-1.5" />
      </label>
      <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground">Create token</button>
      {state.error && <p role="alert" className="w-full text-sm text-bad">⚠ {state.error}</p>}
      {state.token && (
        <div role="status" className="w-full rounded border border-warn/60 bg-warn/10 p-3 text-sm">
          <p>Token for {state.name}: copy it now, it will not be shown again.</p>
          <code data-testid="new-token" className="mt-1 block select-all break-all font-mono">{state.token}</code>
        </div>
      )}
    </form>
  );
}
