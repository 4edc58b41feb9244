/** A revision diff: changed fields in words, then the text line by line with + / − / unchanged marks. */
import type { RevisionDiff } from "@/lib/logbook/revision-diff";

const ROW: Record<string, { className: string; word: string }> = {
  "+": { className: "bg-good/10 text-good", word: "added" },
  "−": { className: "bg-bad/10 text-bad line-through decoration-bad/40", word: "removed" },
  " ": { className: "text-muted", word: "unchanged" },
  "…": { className: "italic text-muted", word: "" },
};

/** Shows what one revision changed compared with the one before it. */
export function DiffView({ diff }: { diff: RevisionDiff }) {
  const nothing = !diff.fields.length && !diff.added && !diff.removed;
  return (
    <div className="space-y-2 text-sm">
      <p className="text-xs text-muted">
        + {diff.added} line{diff.added === 1 ? "" : "s"} added, − {diff.removed} line{diff.removed === 1 ? "" : "s"} removed
        {nothing && " (no change to the text or links)"}
      </p>
      {diff.fields.length > 0 && (
        <ul className="space-y-0.5">
          {diff.fields.map((f) => (
            <li key={f.field}>
              {f.field === "title" && (
                <>Title: <del className="text-bad">− {f.from}</del> → <ins className="text-good no-underline">+ {f.to}</ins></>
              )}
              {f.field === "tags" && <>Tags: {changeList(f.added, f.removed)}</>}
              {f.field === "runNumbers" && <>Linked runs: {changeList(f.added, f.removed)}</>}
            </li>
          ))}
        </ul>
      )}
      {(diff.added > 0 || diff.removed > 0) && (
        <ol className="overflow-x-auto rounded border border-line bg-ground/60 font-mono text-xs" aria-label="Text changes">
          {diff.lines.map((line, i) => {
            const row = ROW[line.sign] ?? ROW[" "]!;
            return (
              <li key={i} className={`flex whitespace-pre-wrap px-2 ${row.className}`}>
                <span aria-hidden className="w-5 shrink-0 select-none font-bold">{line.sign === "…" ? "⋯" : line.sign}</span>
                {row.word && line.sign !== " " && <span className="sr-only">{row.word}: </span>}
                <span className="min-w-0 break-words">{line.text || " "}</span>
              </li>
            );
          })}
        </ol>
      )}
    </div>
  );
}

function changeList(added: (string | number)[], removed: (string | number)[]) {
  return (
    <>
      {added.map((a) => <ins key={`+${a}`} className="mr-2 text-good no-underline">+ {a}</ins>)}
      {removed.map((r) => <del key={`-${r}`} className="mr-2 text-bad">− {r}</del>)}
    </>
  );
}
