/**
 * Browser-side upload of one file to POST /api/entries/{id}/attachments with XMLHttpRequest, because only XHR
 * reports upload progress. The server judges the type and size; this only carries the bytes and the answer back.
 */

export type StoredAttachment = { id: number; entryId: number; fileName: string; contentType: string; sizeBytes: number; state: "stored"; url: string };

export type UploadOutcome =
  | { ok: true; attachment: StoredAttachment }
  | { ok: false; reason: string; attachmentId: number | null };

/** Upload a file; `onProgress` gets the fraction sent (0…1). A failed record can be retried by passing its id. */
export function uploadAttachment(
  entryId: number,
  file: File,
  opts: { onProgress?: (fraction: number) => void; retryOf?: number | null } = {},
): Promise<UploadOutcome> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    const retry = opts.retryOf ? `?retry=${opts.retryOf}` : "";
    xhr.open("POST", `/api/entries/${entryId}/attachments${retry}`);
    xhr.setRequestHeader("x-file-name", encodeURIComponent(file.name));
    xhr.setRequestHeader("content-type", "application/octet-stream");
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) opts.onProgress?.(e.loaded / e.total);
    };
    xhr.onload = () => {
      let body: Record<string, unknown> = {};
      try {
        body = JSON.parse(xhr.responseText) as Record<string, unknown>;
      } catch {
        // a proxy's HTML error page: fall through to the status text
      }
      if (xhr.status === 201) {
        opts.onProgress?.(1);
        resolve({ ok: true, attachment: body as unknown as StoredAttachment });
        return;
      }
      const reason = typeof body.error === "string" ? body.error : `the server answered ${xhr.status} ${xhr.statusText}`;
      resolve({ ok: false, reason, attachmentId: typeof body.attachmentId === "number" ? body.attachmentId : null });
    };
    xhr.onerror = () => resolve({ ok: false, reason: "the connection broke off during the upload; check the network and retry", attachmentId: null });
    xhr.onabort = () => resolve({ ok: false, reason: "the upload was cancelled", attachmentId: null });
    xhr.send(file);
  });
}

/** The markdown that shows an uploaded picture inside the text. */
export function imageMarkdown(fileName: string, url: string): string {
  const alt = fileName.replace(/[[\]\\]/g, "").replace(/\.[a-z0-9]+$/i, "");
  return `![${alt}](${url})`;
}
