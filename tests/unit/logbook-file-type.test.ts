import { describe, it, expect } from "vitest";
import { isImageKind, looksLikeText, sniffBinaryKind } from "@/lib/logbook/file-type";
import { checkFileType } from "@/lib/logbook/attachment-check";
import { LogbookInputError } from "@/lib/logbook/errors";

const bytes = (...parts: (number[] | string)[]) =>
  new Uint8Array(parts.flatMap((p) => (typeof p === "string" ? Array.from(new TextEncoder().encode(p)) : p)));
const le32 = (n: number) => [n & 0xff, (n >> 8) & 0xff, (n >> 16) & 0xff, (n >> 24) & 0xff];

// Heads of real files, each signature from its format specification.
const PNG = bytes([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a], [0, 0, 0, 13], "IHDR"); // PNG spec (W3C / ISO/IEC 15948) §5.2 signature, then the IHDR length and type
const JPEG_JFIF = bytes([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10], "JFIF", [0]); // ITU-T T.81 SOI (FFD8) + JFIF 1.02 APP0 marker (FFE0)
const JPEG_EXIF = bytes([0xff, 0xd8, 0xff, 0xe1, 0x1c, 0x45], "Exif", [0, 0]); // SOI + APP1 "Exif" (JEITA CP-3451, from memory)
const GIF87 = bytes("GIF87a", [0x10, 0, 0x10, 0]); // GIF87a header ("GIF" + version), CompuServe 1987
const GIF89 = bytes("GIF89a", [0x10, 0, 0x10, 0]); // GIF89a specification, "Header" block
const WEBP = bytes("RIFF", le32(1234), "WEBP", "VP8 "); // RFC 9649 §2: "RIFF", file size (LE), "WEBP", then a chunk
const PDF = bytes("%PDF-1.7\n%\xe2\xe3"); // ISO 32000-1 §7.5.2 file header "%PDF-1.n"
const WAV = bytes("RIFF", le32(1234), "WAVE", "fmt "); // RIFF too, but a WAVE file (Microsoft RIFF spec, from memory)
const ZIP = bytes([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]); // local file header "PK\3\4" (PKWARE APPNOTE.TXT §4.3.7)
const ELF = bytes([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01]); // ELF magic 7F 'E' 'L' 'F' (System V ABI)
const PNG_MANGLED = bytes([0x89, 0x50, 0x4e, 0x47, 0x0a, 0x1a, 0x0a]); // CR LF turned into LF: the damage the signature is built to reveal (PNG spec §12.12 rationale)
const UTF8_TEXT = bytes("Xenon purity: electron lifetime 812 µs\r\n"); // µ is C2 B5 in UTF-8 (Unicode Standard, Table 3-7)
const LATIN1_TEXT = bytes("lifetime 812 ", [0xb5], "s"); // a lone B5 is not well-formed UTF-8 (Unicode Standard, Table 3-7)
const UTF16 = bytes([0xff, 0xfe, 0x58, 0x00, 0x65, 0x00]); // UTF-16LE with BOM: NUL bytes between ASCII letters (Unicode FAQ, from memory)

describe("binary signatures", () => {
  it.each([
    { label: "PNG", head: PNG, kind: "png" },
    { label: "JPEG (JFIF)", head: JPEG_JFIF, kind: "jpeg" },
    { label: "JPEG (Exif)", head: JPEG_EXIF, kind: "jpeg" },
    { label: "GIF87a", head: GIF87, kind: "gif" },
    { label: "GIF89a", head: GIF89, kind: "gif" },
    { label: "WebP", head: WEBP, kind: "webp" },
    { label: "PDF", head: PDF, kind: "pdf" },
    { label: "WAV (RIFF but not WebP)", head: WAV, kind: null },
    { label: "ZIP", head: ZIP, kind: null },
    { label: "ELF executable", head: ELF, kind: null },
    { label: "PNG with its CR LF mangled", head: PNG_MANGLED, kind: null },
    { label: "PNG cut after 4 bytes", head: PNG.subarray(0, 4), kind: null },
    { label: "text", head: UTF8_TEXT, kind: null },
  ])("$label → $kind", ({ head, kind }) => {
    expect(sniffBinaryKind(head)).toBe(kind);
  });

  it.each([
    { kind: "png", image: true },
    { kind: "webp", image: true },
    { kind: "pdf", image: false },
    { kind: "csv", image: false },
  ] as const)("$kind is a picture: $image", ({ kind, image }) => {
    expect(isImageKind(kind)).toBe(image);
  });
});

describe("plain text", () => {
  it.each([
    { label: "UTF-8 with CR LF and µ", head: UTF8_TEXT, text: true },
    { label: "CSV", head: bytes("time_utc,o2_percent\n2025-03-04T02:00Z,20.9\n"), text: true },
    { label: "Latin-1 byte B5", head: LATIN1_TEXT, text: false },
    { label: "UTF-16LE (NUL bytes)", head: UTF16, text: false },
    { label: "ELF (DEL byte)", head: ELF, text: false },
    { label: "empty", head: new Uint8Array(0), text: false },
    // 8192 ASCII bytes then µ (C2 B5) split by the 8 KiB sample edge: the cut sequence is not held against the file
    { label: "multi-byte character cut by the sample", head: bytes("a".repeat(8191), [0xc2, 0xb5]), text: true },
  ])("$label → $text", ({ head, text }) => {
    expect(looksLikeText(head)).toBe(text);
  });
});

describe("the server's decision on an upload", () => {
  it.each([
    { label: "PNG named .png", name: "plot.png", head: PNG, type: "image/png" },
    { label: "upper-case extension", name: "PLOT.PNG", head: PNG, type: "image/png" },
    { label: "JPEG named .jpg", name: "scan.jpg", head: JPEG_EXIF, type: "image/jpeg" },
    { label: "JPEG named .jpeg", name: "scan.jpeg", head: JPEG_JFIF, type: "image/jpeg" },
    { label: "GIF", name: "anim.gif", head: GIF89, type: "image/gif" },
    { label: "WebP", name: "shot.webp", head: WEBP, type: "image/webp" },
    { label: "PDF", name: "procedure.pdf", head: PDF, type: "application/pdf" },
    { label: "text named .txt", name: "notes.txt", head: UTF8_TEXT, type: "text/plain; charset=utf-8" },
    { label: "text named .log", name: "daq.log", head: UTF8_TEXT, type: "text/plain; charset=utf-8" },
    { label: "CSV", name: "o2.csv", head: bytes("a,b\n1,2\n"), type: "text/csv; charset=utf-8" },
    { label: "no extension, PNG bytes", name: "export", head: PNG, type: "image/png" },
    { label: "no extension, text", name: "README", head: UTF8_TEXT, type: "text/plain; charset=utf-8" },
  ])("accepts $label as $type", ({ name, head, type }) => {
    expect(checkFileType(name, head).contentType).toBe(type);
  });

  it.each([
    { label: "text named .png", name: "plot.png", head: UTF8_TEXT, code: "file_type_mismatch", says: /named as a PNG image, but its first bytes are not the PNG signature \(they look like plain text\)/ },
    { label: "JPEG named .png", name: "plot.png", head: JPEG_JFIF, code: "file_type_mismatch", says: /they look like a JPEG image/ },
    { label: "ZIP named .pdf", name: "report.pdf", head: ZIP, code: "file_type_mismatch", says: /not the PDF signature \(they match none of the accepted types\)/ },
    { label: "PNG named .txt", name: "notes.txt", head: PNG, code: "file_type_mismatch", says: /not readable UTF-8 text/ },
    { label: "Latin-1 named .csv", name: "o2.csv", head: LATIN1_TEXT, code: "file_type_mismatch", says: /not readable UTF-8 text/ },
    { label: "SVG", name: "diagram.svg", head: bytes("<svg/>"), code: "file_type_not_allowed", says: /\.svg files are not accepted/ },
    { label: "HTML", name: "page.html", head: bytes("<p>hi</p>"), code: "file_type_not_allowed", says: /\.html files are not accepted/ },
    { label: "ZIP without extension", name: "bundle", head: ZIP, code: "file_type_not_allowed", says: /not one of the accepted types/ },
    { label: "empty file", name: "empty.txt", head: new Uint8Array(0), code: "file_empty", says: /empty/ },
  ])("refuses $label ($code)", ({ name, head, code, says }) => {
    let caught: unknown;
    try {
      checkFileType(name, head);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(LogbookInputError);
    expect((caught as LogbookInputError).code).toBe(code);
    expect((caught as LogbookInputError).field).toBe("file");
    expect((caught as Error).message).toMatch(says);
  });
});
