"use client";
/** Notices of the entry form: a restored browser draft, an edit that crossed someone else's save, a saved new entry. */
import Link from "next/link";
import { FileUploads, type FileItem } from "./FileUploads";

/** Says a draft was restored from this browser and offers to throw it away. */
export function DraftNotice({ savedAt, onDiscard }: { savedAt: string; onDiscard: () => void }) {
  const at = new Date(savedAt);
  return (
    <div role="status" className="flex flex-wrap items-center gap-3 rounded border border-info/50 bg-info/10 px-3 py-2 text-sm">
      <span>
        <span aria-hidden>↺ </span>Restored your unsaved draft from{" "}
        <time dateTime={at.toISOString()} title={`local: ${at.toLocaleString()}`}>{at.toISOString().slice(0, 16).replace("T", " ")} UTC</time>. It is not saved yet.
      </span>
      <button type="button" onClick={onDiscard} className="rounded border border-line px-2 py-0.5 text-xs hover:border-bad">
        Discard draft
      </button>
    </div>
  );
}

type ConflictProps = { entryId: number; editedRevision: number; currentRevision: number; onSaveOnTop: () => void };

/** Explains a stale edit: the writer's text is kept; they can read the newer revision, then save theirs on top. */
export function ConflictNotice({ entryId, editedRevision, currentRevision, onSaveOnTop }: ConflictProps) {
  return (
    <div role="alert" className="rounded border border-warn/60 bg-warn/10 px-3 py-2 text-sm">
      <p className="font-medium text-warn"><span aria-hidden>⚠ </span>Not saved: this entry changed while you were editing</p>
      <p className="mt-1">
        You started from revision {editedRevision}; someone has since saved revision {currentRevision}. Your text is kept below, unchanged, and
        in this browser&apos;s draft. Read the newer revision, then save yours on top of it (nothing is overwritten: both stay in the history).
      </p>
      <div className="mt-2 flex flex-wrap gap-3">
        <a href={`/logbook/${entryId}#revision-${currentRevision}`} target="_blank" rel="noopener" className="rounded border border-line px-2 py-0.5 hover:border-accent">
          View revision {currentRevision} ↗
        </a>
        <button type="button" onClick={onSaveOnTop} className="rounded border border-line px-2 py-0.5 hover:border-accent">
          Save mine as revision {currentRevision + 1}
        </button>
      </div>
    </div>
  );
}

type SavedProps = {
  entryId: number;
  uploads: { files: FileItem[]; retry: (entryId: number, item: FileItem) => Promise<unknown> };
  busy: string | null;
};

/** After a new entry is saved: its files' uploads, each with progress and, when one failed, the reason and a retry. */
export function SavedPanel({ entryId, uploads, busy }: SavedProps) {
  return (
    <section aria-label="Saved entry" className="rounded-lg border border-line bg-panel p-4">
      <p role="status" className="text-good">✓ The entry is saved (revision 1). Files are uploaded to it one by one.</p>
      <FileUploads files={uploads.files} onRetry={(item) => void uploads.retry(entryId, item)} />
      {busy && <p className="mt-2 text-sm text-muted">{busy}</p>}
      <div className="mt-3 flex gap-3">
        <Link href={`/logbook/${entryId}`} className="rounded bg-accent px-4 py-1.5 font-medium text-ground">Open the entry</Link>
        {uploads.files.some((f) => f.state === "failed") && (
          <span className="self-center text-sm text-muted">Files that failed can be retried here or added later by editing the entry.</span>
        )}
      </div>
    </section>
  );
}
