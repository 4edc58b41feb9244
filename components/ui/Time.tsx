/** A UTC timestamp as text, with the reader's local time on hover. */
export function Time({ at, withSeconds = false }: { at: Date | string | null | undefined; withSeconds?: boolean }) {
  if (!at) return <span className="text-muted">—</span>;
  const d = typeof at === "string" ? new Date(at) : at;
  const text = d.toISOString().slice(0, withSeconds ? 19 : 16).replace("T", " ");
  return (
    <time dateTime={d.toISOString()} title={`local: ${d.toLocaleString()}`} className="tabular whitespace-nowrap">
      {text}
    </time>
  );
}
