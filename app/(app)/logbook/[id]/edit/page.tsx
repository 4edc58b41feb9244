import Link from "next/link";
import { notFound } from "next/navigation";
import { getEntry } from "@/db/entries";
import { requireRole } from "@/lib/auth/guards";
import { parseMaxBytes } from "@/lib/logbook/attachment-check";
import { EntryForm } from "@/components/logbook/EntryForm";

export const metadata = { title: "Edit entry" };
export const dynamic = "force-dynamic";

export default async function EditEntryPage({ params }: { params: Promise<{ id: string }> }) {
  await requireRole("entries.write");
  const { id } = await params;
  const entry = /^\d+$/.test(id) ? await getEntry(Number(id)) : null;
  if (!entry) notFound();
  if (entry.retractedAt) {
    return (
      <section>
        <h1 className="mb-2 text-xl font-semibold">Edit entry</h1>
        <p role="alert" className="text-bad">⊘ This entry was retracted and can no longer be edited. <Link href={`/logbook/${entry.id}`} className="underline">Back to the entry</Link></p>
      </section>
    );
  }
  return (
    <section className="max-w-5xl">
      <h1 className="mb-1 text-xl font-semibold">Edit entry</h1>
      <p className="mb-3 text-sm text-muted">
        Editing revision {entry.currentRevision} of <Link href={`/logbook/${entry.id}`} className="text-accent underline">{entry.title}</Link>. Saving adds a revision; the earlier ones stay readable.
      </p>
      <EntryForm
        entryId={entry.id}
        baseRevision={entry.currentRevision}
        maxBytes={parseMaxBytes(process.env.ATTACHMENT_MAX_BYTES)}
        initial={{
          category: entry.category,
          title: entry.title,
          body: entry.body,
          tags: entry.tags.join(", "),
          runNumbers: entry.runNumbers.join(", "),
          needsSafetyReview: entry.needsSafetyReview,
        }}
      />
    </section>
  );
}
