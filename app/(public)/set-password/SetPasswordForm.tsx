"use client";
import { useActionState } from "react";
import { setPasswordAction, type SetPasswordState } from "./actions";

/** New-password form for an invitation link. */
export function SetPasswordForm({ token }: { token: string }) {
  const [state, action, pending] = useActionState<SetPasswordState, FormData>(setPasswordAction, {});
  return (
    <form action={action} className="space-y-4">
      <input type="hidden" name="token" value={token} />
      <label className="block">
        <span className="text-sm text-muted">New password (at least 10 characters)</span>
        <input name="password" type="password" autoComplete="new-password" required minLength={10} className="mt-1 w-full rounded border border-line bg-raised px-3 py-2" />
      </label>
      <label className="block">
        <span className="text-sm text-muted">The same again</span>
        <input name="confirm" type="password" autoComplete="new-password" required className="mt-1 w-full rounded border border-line bg-raised px-3 py-2" />
      </label>
      {state.error && (
        <p role="alert" className="rounded border border-bad/60 bg-bad/10 px-3 py-2 text-sm">⚠ {state.error}</p>
      )}
      <button type="submit" disabled={pending} className="w-full rounded bg-accent px-3 py-2 font-medium text-ground disabled:opacity-60">
        {pending ? "Saving…" : "Set password"}
      </button>
    </form>
  );
}
