"use client";
/** The list of files chosen for an entry, each with its own progress bar, state (icon + word) and retry button. */
import { Badge } from "@/components/ui/Badge";
import { formatBytes } from "@/lib/logbook/attachment-check";
import { isImageMime } from "@/lib/logbook/file-type";

export type FileItem = {
  key: string;
  file: File;
  state: "queued" | "uploading" | "stored" | "failed";
  progress: number;
  reason?: string;
  attachmentId?: number | null;
  url?: string;
  contentType?: string;
};

const STATE: Record<FileItem["state"], { tone: "muted" | "info" | "good" | "bad"; icon: string; word: string }> = {
  queued: { tone: "muted", icon: "◷", word: "waits for Save entry" },
  uploading: { tone: "info", icon: "↑", word: "uploading" },
  stored: { tone: "good", icon: "✓", word: "stored" },
  failed: { tone: "bad", icon: "✕", word: "failed" },
};

type Props = {
  files: FileItem[];
  onRetry?: (item: FileItem) => void;
  onRemove?: (item: FileItem) => void;
  onInsert?: (item: FileItem) => void;
};

/** One row per file: name, size, progress, state, reason of a failure, and what can be done next. */
export function FileUploads({ files, onRetry, onRemove, onInsert }: Props) {
  if (!files.length) return null;
  return (
    <ul className="mt-2 divide-y divide-line rounded border border-line" aria-label="Files for this entry">
      {files.map((item) => {
        const s = STATE[item.state];
        const pct = Math.round(item.progress * 100);
        return (
          <li key={item.key} className="grid gap-1 px-3 py-2 text-sm sm:grid-cols-[minmax(0,1fr)_12rem_auto] sm:items-center" data-testid="upload-row">
            <div className="min-w-0">
              <span className="block truncate font-medium" title={item.file.name}>{item.file.name}</span>
              <span className="text-xs text-muted">{formatBytes(item.file.size)}</span>
              {item.state === "failed" && item.reason && (
                <p role="alert" className="text-xs text-bad">⚠ {item.file.name} did not upload: {item.reason}</p>
              )}
            </div>
            <div className="flex items-center gap-2">
              <progress
                className="h-2 w-full accent-[rgb(var(--accent))]"
                max={100}
                value={pct}
                aria-label={`Upload of ${item.file.name}`}
                aria-valuetext={`${pct} % ${s.word}`}
              />
              <span className="tabular w-10 text-right text-xs text-muted">{pct} %</span>
            </div>
            <div className="flex flex-wrap items-center gap-2">
              <Badge tone={s.tone} icon={s.icon}>{s.word}</Badge>
              {item.state === "failed" && onRetry && (
                <button type="button" onClick={() => onRetry(item)} className="rounded border border-line px-2 py-0.5 text-xs hover:border-accent">
                  ↻ Retry {item.file.name}
                </button>
              )}
              {item.state === "stored" && onInsert && item.url && isImageMime(item.contentType ?? "") && (
                <button type="button" onClick={() => onInsert(item)} className="rounded border border-line px-2 py-0.5 text-xs hover:border-accent">
                  Insert into text
                </button>
              )}
              {(item.state === "queued" || item.state === "failed") && onRemove && (
                <button type="button" onClick={() => onRemove(item)} aria-label={`Remove ${item.file.name}`} className="rounded px-1 text-xs text-muted hover:text-ink">
                  ✕ remove
                </button>
              )}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
