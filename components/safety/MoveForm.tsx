"use client";
import { useActionState } from "react";
import { moveReviewAction, type FormState } from "@/app/(app)/safety/actions";

/** The moves a safety officer can make on an item now; each needs a comment, which lands in the trail. */
export function MoveForm({ reviewId, moves }: { reviewId: number; moves: { to: string; verb: string }[] }) {
  const [state, action, pending] = useActionState<FormState, FormData>(moveReviewAction, {});
  if (moves.length === 0) {
    return <p className="text-sm text-muted">No move is open from this state. A new revision of the entry puts it back to &ldquo;Awaiting review&rdquo;.</p>;
  }
  return (
    <form action={action} className="rounded-lg border border-line bg-panel p-4" aria-label="Move this item">
      <input type="hidden" name="reviewId" value={reviewId} />
      <label className="block">
        <span className="text-xs text-muted">Comment (required: what you checked, what is asked)</span>
        <textarea
          name="comment"
          rows={3}
          aria-invalid={state.field === "comment" || undefined}
          className="mt-1 w-full rounded border border-line bg-raised px-2 py-1.5"
        />
      </label>
      <div className="mt-3 flex flex-wrap gap-2">
        {moves.map((m) => (
          <button key={m.to} type="submit" name="to" value={m.to} disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">
            {m.verb}
          </button>
        ))}
        {pending && <span role="status" className="self-center text-sm text-muted">Saving…</span>}
      </div>
      {state.error && <p role="alert" className="mt-2 text-sm text-bad">⚠ {state.error}</p>}
      {state.done && !state.error && <p role="status" className="mt-2 text-sm text-good">✓ Saved.</p>}
    </form>
  );
}
