/** The full history of an entry: every revision, newest first, each with its diff against the one before. */
import type { RevisionView } from "@/db/entries";
import { Time } from "@/components/ui/Time";
import { Badge } from "@/components/ui/Badge";
import { revisionDiff } from "@/lib/logbook/revision-diff";
import { DiffView } from "./DiffView";
import { EntryBody } from "./EntryBody";

/** The revision list; the newest is open, older ones fold. */
export function RevisionHistory({ revisions }: { revisions: RevisionView[] }) {
  const newestFirst = [...revisions].sort((a, b) => b.revision - a.revision);
  return (
    <section aria-labelledby="history-heading" className="mt-8">
      <h2 id="history-heading" className="mb-2 text-lg font-semibold">
        History <span className="text-sm font-normal text-muted">({revisions.length} revision{revisions.length === 1 ? "" : "s"})</span>
      </h2>
      <ol className="space-y-3" aria-label="Revisions">
        {newestFirst.map((rev) => {
          const previous = revisions.find((r) => r.revision === rev.revision - 1);
          return (
            <li key={rev.revision} id={`revision-${rev.revision}`} className="rounded-lg border border-line bg-panel p-3" data-testid="revision">
              <div className="flex flex-wrap items-center gap-2 text-sm">
                <span className="font-medium">Revision {rev.revision}</span>
                {rev.isCurrent && <Badge tone="accent" icon="●">current</Badge>}
                <span className="text-muted">by {rev.authorName}</span>
                <Time at={rev.createdAt} withSeconds />
              </div>
              <div className="mt-2">
                {previous ? <DiffView diff={revisionDiff(previous, rev)} /> : <p className="text-xs text-muted">First version of the entry.</p>}
              </div>
              <details className="mt-2 text-sm" open={false}>
                <summary className="cursor-pointer text-xs text-muted">Show revision {rev.revision} as written: “{rev.title}”</summary>
                <div className="mt-2 border-l-2 border-line pl-3">
                  <EntryBody markdown={rev.body} />
                </div>
              </details>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
