/** An entry's files: pictures as thumbnails, other files as downloads, unfinished or failed uploads with their reason. */
import type { AttachmentView } from "@/db/attachments";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import { formatBytes } from "@/lib/logbook/attachment-check";
import { isImageMime } from "@/lib/logbook/file-type";

/** The attachments section of an entry page. */
export function AttachmentList({ files, canAdd, entryId }: { files: AttachmentView[]; canAdd: boolean; entryId: number }) {
  const stored = files.filter((f) => f.state === "stored");
  const others = files.filter((f) => f.state !== "stored");
  const pictures = stored.filter((f) => isImageMime(f.contentType));
  const documents = stored.filter((f) => !isImageMime(f.contentType));
  return (
    <section aria-labelledby="files-heading" className="mt-6">
      <h2 id="files-heading" className="mb-2 text-lg font-semibold">Files</h2>
      {!files.length && (
        <EmptyState title="No files attached">
          {canAdd ? <>Plots, screenshots or PDFs can be attached by <a className="text-accent underline" href={`/logbook/${entryId}/edit`}>editing the entry</a>.</> : "Nothing was attached to this entry."}
        </EmptyState>
      )}
      {pictures.length > 0 && (
        <ul className="flex flex-wrap gap-3" aria-label="Pictures">
          {pictures.map((f) => (
            <li key={f.id} className="rounded border border-line bg-panel p-1">
              <a href={f.url} target="_blank" rel="noopener" title={`${f.fileName} · ${formatBytes(f.sizeBytes)} · opens full size`}>
                <img src={f.url} alt={f.fileName} loading="lazy" className="h-32 w-auto max-w-[16rem] object-contain" data-testid="thumbnail" />
              </a>
              <p className="max-w-[16rem] truncate px-1 text-xs text-muted">{f.fileName}</p>
            </li>
          ))}
        </ul>
      )}
      {documents.length > 0 && (
        <ul className="mt-3 space-y-1 text-sm" aria-label="Documents">
          {documents.map((f) => (
            <li key={f.id}>
              <a href={f.url} className="text-accent underline">⬇ {f.fileName}</a>{" "}
              <span className="text-xs text-muted">{formatBytes(f.sizeBytes)} · {f.contentType.split(";")[0]}</span>
            </li>
          ))}
        </ul>
      )}
      {others.length > 0 && (
        <ul className="mt-3 space-y-1 text-sm" aria-label="Uploads not stored">
          {others.map((f) => (
            <li key={f.id} className="flex flex-wrap items-center gap-2">
              {f.state === "failed" ? <Badge tone="bad" icon="✕">upload failed</Badge> : <Badge tone="muted" icon="◷">upload not finished</Badge>}
              <span>{f.fileName}</span>
              {f.failureReason && <span className="text-xs text-muted">— {f.failureReason}</span>}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
