"use client";
import { useActionState } from "react";
import { ROLES } from "@/db/schema/auth";
import { ROLE_LABELS } from "@/components/ui/roles";
import { inviteAction, type InviteState } from "./actions";

/** Invite a person by e-mail with their first roles. */
export function InviteForm() {
  const [state, action, pending] = useActionState<InviteState, FormData>(inviteAction, {});
  return (
    <form action={action} className="grid gap-3 rounded-lg border border-line bg-panel p-4 md:grid-cols-[1fr_1fr_auto]" aria-label="Invite a person">
      <label className="block">
        <span className="text-xs text-muted">Name</span>
        <input name="displayName" required className="mt-1 w-full rounded border border-line bg-raised px-2 py-1.5" />
      </label>
      <label className="block">
        <span className="text-xs text-muted">E-mail</span>
        <input name="email" type="email" required className="mt-1 w-full rounded border border-line bg-raised px-2 py-1.5" />
      </label>
      <button type="submit" disabled={pending} className="self-end rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">
        {pending ? "Sending…" : "Send invitation"}
      </button>
      <fieldset className="flex flex-wrap gap-4 md:col-span-3">
        <legend className="mb-1 text-xs text-muted">Roles</legend>
        {ROLES.map((r) => (
          <label key={r} className="flex items-center gap-1.5 text-sm">
            <input type="checkbox" name="roles" value={r} /> {ROLE_LABELS[r]}
          </label>
        ))}
      </fieldset>
      {state.error && <p role="alert" className="text-sm text-bad md:col-span-3">⚠ {state.error}</p>}
      {state.sentTo && <p role="status" className="text-sm text-good md:col-span-3">✓ Invitation sent to {state.sentTo}. The link is valid for 48 hours.</p>}
    </form>
  );
}
