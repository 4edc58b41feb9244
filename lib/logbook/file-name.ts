/**
 * File names of attachments are display text only (the object key is made by the server), but they still end up in
 * pages and in Content-Disposition headers, so they are cleaned: no paths, no control or direction-changing
 * characters, no characters reserved by common file systems, a sane length.
 */

const MAX_NAME_CHARS = 120;
const FALLBACK = "attachment";
// C0 and C1 controls and DEL; bidi embeddings/overrides/isolates and marks; zero-width characters and the BOM.
// eslint-disable-next-line no-control-regex -- matching control characters is the point here
const INVISIBLE = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/g;
// Reserved on Windows and awkward in headers: < > : " / \ | ? * (common practice).
const RESERVED = /[<>:"/\\|?*]/g;
// Device names Windows refuses as file names, with or without an extension (common practice).
const DEVICE_NAMES = /^(con|prn|aux|nul|com[1-9]|lpt[1-9])(\..*)?$/i;

/** A clean display name for an uploaded file: base name only, no invisible or reserved characters, ≤ 120 characters. */
export function sanitiseFileName(raw: string): string {
  const base = raw.split(/[/\\]/).pop() ?? "";
  // Whitespace (tabs, line breaks) becomes one space before the remaining controls are dropped.
  let name = base.normalize("NFC").replace(/\s+/g, " ").replace(INVISIBLE, "").replace(RESERVED, "_").trim();
  name = name.replace(/^[.\s]+/, "").replace(/[.\s]+$/, "");
  if (DEVICE_NAMES.test(name)) name = `_${name}`;
  if (name === "") return FALLBACK;
  return shorten(name);
}

/** Cut a long name in the middle of its stem so that the extension survives. */
function shorten(name: string): string {
  const chars = Array.from(name);
  if (chars.length <= MAX_NAME_CHARS) return name;
  const dot = name.lastIndexOf(".");
  const ext = dot > 0 && name.length - dot <= 12 ? Array.from(name.slice(dot)) : [];
  const stem = chars.slice(0, MAX_NAME_CHARS - ext.length - 1);
  return `${stem.join("").trimEnd()}…${ext.join("")}`;
}

/**
 * A Content-Disposition value (RFC 6266) with an ASCII fallback name and the exact name in RFC 8187 encoding,
 * e.g. `attachment; filename="Muller.pdf"; filename*=UTF-8''M%C3%BCller.pdf`.
 */
export function contentDisposition(fileName: string, inline: boolean): string {
  const clean = sanitiseFileName(fileName);
  // Fallback for old clients: accents dropped (NFKD, then combining marks removed), anything else non-ASCII as "_".
  const ascii = clean.normalize("NFKD").replace(/\p{M}/gu, "").replace(/[^\x20-\x7e]/g, "_").replace(/[%;\\"]/g, "_");
  const encoded = encodeURIComponent(clean).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `${inline ? "inline" : "attachment"}; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}
