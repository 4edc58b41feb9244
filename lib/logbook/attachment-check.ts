/**
 * The server's decision on an uploaded file: its real type (from the first bytes, see file-type.ts) must agree with
 * what its name claims, it must be one of the accepted kinds, and it must fit the size limit.
 */
import { LogbookInputError } from "./errors";
import { ALLOWED_KINDS_TEXT, KIND_MIME, looksLikeText, sniffBinaryKind, type FileKind } from "./file-type";

/** Default limit per file: 50 MB (SI megabytes, 50 000 000 bytes). */
export const DEFAULT_MAX_BYTES = 50_000_000;

const EXTENSION_KIND: Record<string, FileKind> = {
  png: "png",
  jpg: "jpeg",
  jpeg: "jpeg",
  jpe: "jpeg",
  jfif: "jpeg",
  gif: "gif",
  webp: "webp",
  pdf: "pdf",
  txt: "text",
  text: "text",
  log: "text",
  csv: "csv",
};

const KIND_LABEL: Record<FileKind, string> = {
  png: "a PNG image",
  jpeg: "a JPEG image",
  gif: "a GIF image",
  webp: "a WebP image",
  pdf: "a PDF document",
  text: "plain text",
  csv: "a CSV table",
};

/** The lower-case extension of a file name without the dot ("" when there is none). */
export function extensionOf(fileName: string): string {
  const base = fileName.split(/[/\\]/).pop() ?? "";
  const dot = base.lastIndexOf(".");
  return dot > 0 ? base.slice(dot + 1).toLowerCase() : "";
}

export type CheckedFile = { kind: FileKind; contentType: string };

/** Decide what an upload is from its name and first bytes; throws LogbookInputError with the reason when refused. */
export function checkFileType(fileName: string, head: Uint8Array): CheckedFile {
  if (head.length === 0) throw new LogbookInputError("file_empty", "file", `"${fileName}" is empty (0 bytes)`);
  const ext = extensionOf(fileName);
  const claimed = EXTENSION_KIND[ext];
  const binary = sniffBinaryKind(head);
  const text = binary === null && looksLikeText(head);
  const actual: FileKind | null = binary ?? (text ? (claimed === "csv" ? "csv" : "text") : null);
  const actualWords = actual ? `they look like ${KIND_LABEL[actual]}` : "they match none of the accepted types";

  if (ext !== "" && claimed === undefined) {
    throw new LogbookInputError("file_type_not_allowed", "file", `.${ext} files are not accepted; attach ${ALLOWED_KINDS_TEXT}`);
  }
  if (claimed !== undefined) {
    if (claimed !== actual) {
      const signature = claimed === "text" || claimed === "csv" ? "readable UTF-8 text" : `the ${ext.toUpperCase()} signature`;
      throw new LogbookInputError(
        "file_type_mismatch",
        "file",
        `"${fileName}" is named as ${KIND_LABEL[claimed]}, but its first bytes are not ${signature} (${actualWords}); nothing was stored`,
      );
    }
    return { kind: claimed, contentType: KIND_MIME[claimed] };
  }
  if (actual === null) {
    throw new LogbookInputError("file_type_not_allowed", "file", `"${fileName}" is not one of the accepted types; attach ${ALLOWED_KINDS_TEXT}`);
  }
  return { kind: actual, contentType: KIND_MIME[actual] };
}

/** Format a byte count in SI units (kB = 1000 B, MB = 10^6 B), e.g. 1 530 000 → "1.5 MB". */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return "—";
  if (bytes < 1000) return `${bytes} B`;
  const units = ["kB", "MB", "GB", "TB"];
  let value = bytes / 1000;
  let i = 0;
  while (value >= 1000 && i < units.length - 1) {
    value /= 1000;
    i++;
  }
  const digits = value >= 100 ? 0 : 1;
  return `${value.toFixed(digits).replace(/\.0$/, "")} ${units[i]}`;
}

/** Refuse a file larger than the limit (or of no size); the message names both sizes. */
export function checkFileSize(sizeBytes: number, maxBytes: number, fileName = "the file"): void {
  if (!Number.isInteger(sizeBytes) || sizeBytes < 0) {
    throw new LogbookInputError("file_empty", "file", `the size of ${fileName} is unknown`);
  }
  if (sizeBytes === 0) throw new LogbookInputError("file_empty", "file", `${fileName} is empty (0 bytes)`);
  if (sizeBytes > maxBytes) {
    throw new LogbookInputError("file_too_large", "file", `${fileName} is ${formatBytes(sizeBytes)}; the limit is ${formatBytes(maxBytes)} per file`);
  }
}

/** The per-file limit from the ATTACHMENT_MAX_BYTES setting (whole bytes); unset means the 50 MB default. */
export function parseMaxBytes(setting: string | undefined): number {
  if (setting === undefined || setting.trim() === "") return DEFAULT_MAX_BYTES;
  const text = setting.trim();
  if (!/^\d+$/.test(text) || Number(text) < 1 || !Number.isSafeInteger(Number(text))) {
    throw new LogbookInputError("invalid_limit", "ATTACHMENT_MAX_BYTES", `ATTACHMENT_MAX_BYTES must be a whole number of bytes, got "${setting}"`);
  }
  return Number(text);
}
