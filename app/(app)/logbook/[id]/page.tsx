import Link from "next/link";
import { notFound } from "next/navigation";
import { getEntry } from "@/db/entries";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { Badge } from "@/components/ui/Badge";
import { Caution } from "@/components/ui/Caution";
import { Time } from "@/components/ui/Time";
import { AttachmentList } from "@/components/logbook/AttachmentList";
import { CategoryBadge } from "@/components/logbook/CategoryBadge";
import { EntryBody } from "@/components/logbook/EntryBody";
import { RetractForm } from "@/components/logbook/RetractForm";
import { RevisionHistory } from "@/components/logbook/RevisionHistory";
import { CAUTION_CATEGORIES } from "@/components/logbook/categories";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }>; searchParams: Promise<{ warning?: string }> };

export async function generateMetadata({ params }: Props) {
  const { id } = await params;
  return { title: `Entry ${id}` };
}

export default async function EntryPage({ params, searchParams }: Props) {
  const user = await requireRole("entries.read");
  const { id } = await params;
  const { warning } = await searchParams;
  const entry = /^\d{1,9}$/.test(id) ? await getEntry(Number(id)) : null;
  if (!entry) notFound();
  const canWrite = rolesAllow(user.roles, "entries.write") && !entry.retractedAt;
  const canRetract = rolesAllow(user.roles, "entries.retract") && !entry.retractedAt;
  return (
    <article className="max-w-5xl">
      <p className="mb-2 text-sm"><Link href="/logbook" className="text-muted hover:text-ink">← Logbook</Link></p>
      {warning && <p role="alert" className="mb-3 rounded border border-warn/60 bg-warn/10 px-3 py-2 text-sm text-warn">⚠ {warning}</p>}
      {CAUTION_CATEGORIES.includes(entry.category) && <Caution />}
      {entry.retractedAt && (
        <div role="note" className="mb-3 rounded border border-bad/60 bg-bad/10 px-3 py-2 text-sm">
          <p className="font-medium text-bad"><span aria-hidden>⊘ </span>Retracted</p>
          <p>
            By {entry.retractedByName ?? "an admin"} at <Time at={entry.retractedAt} /> UTC. Reason: <span data-testid="retract-reason">{entry.retractReason}</span>
          </p>
        </div>
      )}
      <header className="mb-3">
        <div className="flex flex-wrap items-center gap-2">
          <CategoryBadge category={entry.category} />
          {entry.needsSafetyReview && <Badge tone="warn" icon="✚">marked for safety review</Badge>}
          <Badge tone="muted" icon="✎">revision {entry.currentRevision}</Badge>
        </div>
        <h1 className={`mt-2 text-2xl font-semibold ${entry.retractedAt ? "line-through decoration-bad" : ""}`}>{entry.title}</h1>
        <p className="mt-1 text-sm text-muted">
          Written by {entry.authorName} at <Time at={entry.createdAt} /> UTC
          {entry.currentRevision > 1 && (
            <> · last revised at <Time at={entry.updatedAt} /> UTC</>
          )}
        </p>
        <div className="mt-1 flex flex-wrap gap-3 text-sm">
          <span>
            Linked runs:{" "}
            {entry.runNumbers.length ? entry.runNumbers.map((n) => <Link key={n} href={`/runs/${n}`} className="mr-1 text-accent hover:underline">{n}</Link>) : <span className="text-muted">none</span>}
          </span>
          <span>
            Tags:{" "}
            {entry.tags.length ? entry.tags.map((t) => <Link key={t} href={`/logbook?tag=${encodeURIComponent(t)}`} className="mr-1 text-accent hover:underline">#{t}</Link>) : <span className="text-muted">none</span>}
          </span>
        </div>
        {canWrite && (
          <Link href={`/logbook/${entry.id}/edit`} className="mt-3 inline-block rounded border border-line px-3 py-1 text-sm hover:border-accent">✎ Edit (makes revision {entry.currentRevision + 1})</Link>
        )}
      </header>
      <div className="rounded-lg border border-line bg-panel p-4" data-testid="entry-body">
        <EntryBody markdown={entry.body} />
      </div>
      <AttachmentList files={entry.attachments} canAdd={canWrite} entryId={entry.id} />
      <RevisionHistory revisions={entry.revisions} />
      {canRetract && <RetractForm entryId={entry.id} />}
    </article>
  );
}
