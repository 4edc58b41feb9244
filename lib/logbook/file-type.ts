/**
 * What kind of file an attachment really is, judged by its first bytes (its "magic number"), never by its name.
 * Signatures come from the format specifications:
 *   PNG  89 50 4E 47 0D 0A 1A 0A            (PNG spec, W3C / ISO/IEC 15948, §5.2 "PNG signature")
 *   JPEG FF D8 FF                           (JPEG, ITU-T T.81 / ISO/IEC 10918-1: SOI marker FFD8 followed by a marker)
 *   GIF  "GIF87a" or "GIF89a"               (GIF89a specification, CompuServe 1990, "Header")
 *   WebP "RIFF" <4-byte size> "WEBP"        (RFC 9649, WebP Image Format, §2 "RIFF file format")
 *   PDF  "%PDF-"                            (ISO 32000-1/-2, §7.5.2 "File header")
 * Plain text and CSV have no signature: they are accepted when the bytes decode as UTF-8 without control bytes.
 */

export type FileKind = "png" | "jpeg" | "gif" | "webp" | "pdf" | "text" | "csv";

/** The MIME type stored and served for each accepted kind. */
export const KIND_MIME: Record<FileKind, string> = {
  png: "image/png",
  jpeg: "image/jpeg",
  gif: "image/gif",
  webp: "image/webp",
  pdf: "application/pdf",
  text: "text/plain; charset=utf-8",
  csv: "text/csv; charset=utf-8",
};

/** Plain words for the kinds a writer may attach (shown in the form). */
export const ALLOWED_KINDS_TEXT = "images (PNG, JPEG, GIF, WebP), PDF, plain text (.txt, .log) and CSV";

const ascii = (s: string): number[] => Array.from(s, (c) => c.charCodeAt(0));

const SIGNATURES: { kind: Exclude<FileKind, "text" | "csv">; at: number; bytes: number[] }[] = [
  { kind: "png", at: 0, bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { kind: "jpeg", at: 0, bytes: [0xff, 0xd8, 0xff] },
  { kind: "gif", at: 0, bytes: ascii("GIF87a") },
  { kind: "gif", at: 0, bytes: ascii("GIF89a") },
  { kind: "pdf", at: 0, bytes: ascii("%PDF-") },
];

function matchesAt(bytes: Uint8Array, at: number, expected: number[]): boolean {
  if (bytes.length < at + expected.length) return false;
  return expected.every((b, i) => bytes[at + i] === b);
}

function isWebp(bytes: Uint8Array): boolean {
  return matchesAt(bytes, 0, ascii("RIFF")) && matchesAt(bytes, 8, ascii("WEBP"));
}

/** True when the bytes read as UTF-8 text: no NUL or other C0 controls except tab, line feed, form feed, carriage return. */
export function looksLikeText(bytes: Uint8Array): boolean {
  if (bytes.length === 0) return false;
  // Only the head is judged; a multi-byte character cut at the end of the sample is not an error.
  const head = bytes.subarray(0, 8192);
  for (const b of head) {
    if (b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0c && b !== 0x0d) return false;
    if (b === 0x7f) return false;
  }
  try {
    new TextDecoder("utf-8", { fatal: true }).decode(head.length < bytes.length ? trimPartialUtf8(head) : head);
    return true;
  } catch {
    return false;
  }
}

/** Drop a trailing, incomplete UTF-8 sequence (at most 3 bytes) so a cut sample still decodes. */
function trimPartialUtf8(head: Uint8Array): Uint8Array {
  for (let back = 1; back <= 3 && back <= head.length; back++) {
    const b = head[head.length - back] ?? 0;
    if ((b & 0xc0) === 0x80) continue; // continuation byte: keep looking for the lead byte
    const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
    return need > back ? head.subarray(0, head.length - back) : head;
  }
  return head;
}

/** The binary kind the first bytes announce (PNG, JPEG, GIF, WebP, PDF), or null when none matches. */
export function sniffBinaryKind(bytes: Uint8Array): Exclude<FileKind, "text" | "csv"> | null {
  if (isWebp(bytes)) return "webp";
  return SIGNATURES.find((s) => matchesAt(bytes, s.at, s.bytes))?.kind ?? null;
}

/** True for the kinds shown inline as pictures. */
export function isImageKind(kind: FileKind): boolean {
  return kind === "png" || kind === "jpeg" || kind === "gif" || kind === "webp";
}

/** True when a stored content type is one of the picture types (for thumbnails). */
export function isImageMime(contentType: string): boolean {
  return ["image/png", "image/jpeg", "image/gif", "image/webp"].includes(contentType.split(";")[0]?.trim() ?? "");
}
