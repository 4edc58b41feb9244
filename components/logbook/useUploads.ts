"use client";
/** The files of the entry form and their uploads: queue, upload with progress, retry, remove. */
import { useCallback, useRef, useState } from "react";
import { checkFileSize } from "@/lib/logbook/attachment-check";
import { LogbookInputError } from "@/lib/logbook/errors";
import type { FileItem } from "./FileUploads";
import { uploadAttachment, type UploadOutcome } from "./upload";

let counter = 0;
const nextKey = () => `f${++counter}`;

/** File list state with upload actions; the size limit is checked here too, so an oversize file fails at once. */
export function useUploads(maxBytes: number) {
  const [files, setFiles] = useState<FileItem[]>([]);
  const filesRef = useRef<FileItem[]>([]);
  const [active, setActive] = useState(0);

  const update = useCallback((key: string, patch: Partial<FileItem>) => {
    setFiles((prev) => {
      const next = prev.map((f) => (f.key === key ? { ...f, ...patch } : f));
      filesRef.current = next;
      return next;
    });
  }, []);

  const append = useCallback((items: FileItem[]) => {
    setFiles((prev) => {
      const next = [...prev, ...items];
      filesRef.current = next;
      return next;
    });
  }, []);

  const itemFor = useCallback(
    (file: File): FileItem => {
      try {
        checkFileSize(file.size, maxBytes, `"${file.name}"`);
        return { key: nextKey(), file, state: "queued", progress: 0 };
      } catch (err) {
        const reason = err instanceof LogbookInputError ? err.message : String(err);
        return { key: nextKey(), file, state: "failed", progress: 0, reason };
      }
    },
    [maxBytes],
  );

  const run = useCallback(
    async (entryId: number, item: FileItem): Promise<UploadOutcome> => {
      setActive((n) => n + 1);
      update(item.key, { state: "uploading", progress: 0, reason: undefined });
      const outcome = await uploadAttachment(entryId, item.file, {
        retryOf: item.attachmentId ?? null,
        onProgress: (fraction) => update(item.key, { progress: fraction }),
      });
      setActive((n) => n - 1);
      if (outcome.ok) {
        update(item.key, { state: "stored", progress: 1, attachmentId: outcome.attachment.id, url: outcome.attachment.url, contentType: outcome.attachment.contentType });
      } else {
        update(item.key, { state: "failed", reason: outcome.reason, attachmentId: outcome.attachmentId ?? item.attachmentId ?? null });
      }
      return outcome;
    },
    [update],
  );

  /** Queue files to upload once the entry exists. */
  const add = useCallback((picked: File[]) => append(picked.map(itemFor)), [append, itemFor]);

  /** Add one file and upload it now (the entry exists already). */
  const addAndUpload = useCallback(
    async (entryId: number, file: File): Promise<UploadOutcome> => {
      const item = itemFor(file);
      append([item]);
      if (item.state === "failed") return { ok: false, reason: item.reason ?? "refused", attachmentId: null };
      return run(entryId, item);
    },
    [append, itemFor, run],
  );

  /** Upload every queued file, one after another, to the just-saved entry; resolves with every outcome. */
  const uploadQueued = useCallback(
    async (entryId: number): Promise<UploadOutcome[]> => {
      const outcomes: UploadOutcome[] = filesRef.current
        .filter((f) => f.state === "failed")
        .map((f) => ({ ok: false, reason: f.reason ?? "refused", attachmentId: null }));
      for (const item of filesRef.current.filter((f) => f.state === "queued")) outcomes.push(await run(entryId, item));
      return outcomes;
    },
    [run],
  );

  /** Upload a failed file again (reusing its failed record when the server made one). */
  const retry = useCallback((entryId: number, item: FileItem) => run(entryId, item), [run]);

  /** Drop a file that has not been stored. */
  const remove = useCallback((item: FileItem) => {
    setFiles((prev) => {
      const next = prev.filter((f) => f.key !== item.key);
      filesRef.current = next;
      return next;
    });
  }, []);

  const queued = useCallback(() => filesRef.current.filter((f) => f.state === "queued"), []);

  return { files, busy: active > 0, add, addAndUpload, uploadQueued, retry, remove, queued };
}
