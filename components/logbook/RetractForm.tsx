"use client";
/** Admins only: retract an entry with a reason. The entry stays readable, marked as retracted, and in the audit trail. */
import { useState } from "react";
import { useRouter } from "next/navigation";

/** A folded form that asks for the reason and calls POST /api/entries/{id}/retract. */
export function RetractForm({ entryId }: { entryId: number }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setPending(true);
    setError(null);
    const res = await fetch(`/api/entries/${entryId}/retract`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ reason }),
    }).catch(() => null);
    setPending(false);
    if (!res) return setError("Could not reach the server; the entry is not retracted.");
    if (!res.ok) {
      const body = (await res.json().catch(() => ({}))) as { error?: string };
      return setError(body.error ?? `The server answered ${res.status}.`);
    }
    router.refresh();
  }
  return (
    <details className="mt-6 rounded border border-line p-3 text-sm">
      <summary className="cursor-pointer text-muted">Retract this entry (admin)</summary>
      <form onSubmit={submit} className="mt-2 space-y-2">
        <label className="block">
          <span className="text-xs text-muted">Reason for retraction</span>
          <textarea value={reason} onChange={(e) => setReason(e.target.value)} required minLength={5} rows={2} className="mt-1 w-full rounded border border-line bg-raised px-2 py-1.5" />
        </label>
        <p className="text-xs text-muted">The entry stays visible, struck through, with this reason; its history and the audit trail keep everything.</p>
        {error && <p role="alert" className="text-bad">⚠ {error}</p>}
        <button type="submit" disabled={pending} className="rounded border border-bad/60 px-3 py-1 text-bad disabled:opacity-60">
          {pending ? "Retracting…" : "Retract entry"}
        </button>
      </form>
    </details>
  );
}
