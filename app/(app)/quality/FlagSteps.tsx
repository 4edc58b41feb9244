"use client";
import { useActionState, useState } from "react";
import { submitKeepingInput } from "@/components/quality/keep-form";
import { confirmFlagAction, withdrawFlagAction, type FormState } from "./actions";

/**
 * Confirm and withdraw for one flag. `ownProposal` only changes what is offered (the server refuses anyway):
 * the proposer sees why they cannot confirm instead of a button.
 */
export function FlagSteps({ flagId, state, ownProposal }: { flagId: number; state: "proposed" | "confirmed" | "withdrawn"; ownProposal: boolean }) {
  const [confirmState, confirm, confirming] = useActionState<FormState, FormData>(confirmFlagAction, {});
  const [withdrawState, withdraw, withdrawing] = useActionState<FormState, FormData>(withdrawFlagAction, {});
  const [askReason, setAskReason] = useState(false);
  if (state === "withdrawn") return null;
  const message = confirmState.error ?? withdrawState.error;
  const done = confirmState.done ?? withdrawState.done;
  return (
    <div className="flex flex-wrap items-center gap-2">
      {state === "proposed" && !ownProposal && (
        <form action={confirm}>
          <input type="hidden" name="id" value={flagId} />
          <button type="submit" disabled={confirming} aria-label={`Confirm flag ${flagId}`} className="rounded bg-good/20 px-2 py-0.5 text-xs font-medium text-good disabled:opacity-60">
            {confirming ? "Confirming…" : "✓ Confirm"}
          </button>
        </form>
      )}
      {state === "proposed" && ownProposal && (
        <span className="text-xs text-muted" title="Two-person rule">Your proposal: another expert confirms it</span>
      )}
      {!askReason ? (
        <button type="button" onClick={() => setAskReason(true)} aria-label={`Withdraw flag ${flagId}`} className="rounded border border-line px-2 py-0.5 text-xs">
          ⊘ Withdraw…
        </button>
      ) : (
        <form onSubmit={submitKeepingInput(withdraw)} className="flex items-center gap-1">
          <input type="hidden" name="id" value={flagId} />
          <label className="text-xs">
            <span className="sr-only">Reason for withdrawing flag {flagId}</span>
            <input name="reason" required minLength={3} placeholder="why withdraw?" className="w-44 rounded border border-line bg-raised px-1.5 py-0.5" />
          </label>
          <button type="submit" disabled={withdrawing} className="rounded border border-line px-2 py-0.5 text-xs">
            {withdrawing ? "Withdrawing…" : "Withdraw"}
          </button>
          <button type="button" onClick={() => setAskReason(false)} className="px-1 text-xs text-muted">Cancel</button>
        </form>
      )}
      {message && <p role="alert" className="w-full text-xs text-bad">⚠ {message}</p>}
      {done && <p role="status" className="w-full text-xs text-good">✓ {done}</p>}
    </div>
  );
}
