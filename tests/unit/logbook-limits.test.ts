import { describe, it, expect } from "vitest";
import { checkFileSize, DEFAULT_MAX_BYTES, extensionOf, formatBytes, parseMaxBytes } from "@/lib/logbook/attachment-check";
import { LogbookInputError } from "@/lib/logbook/errors";

const codeOf = (fn: () => unknown): string | null => {
  try {
    fn();
    return null;
  } catch (err) {
    return err instanceof LogbookInputError ? err.code : "other";
  }
};

describe("size limit per file", () => {
  it("defaults to 50 MB = 50 000 000 bytes (SI megabyte, BIPM SI Brochure 9th ed.)", () => {
    expect(DEFAULT_MAX_BYTES).toBe(50_000_000);
  });

  it.each([
    { label: "exactly at the limit", size: 50_000_000, max: 50_000_000, code: null },
    { label: "one byte over", size: 50_000_001, max: 50_000_000, code: "file_too_large" },
    { label: "small limit from the environment", size: 2_048, max: 1_024, code: "file_too_large" },
    { label: "empty file", size: 0, max: 1_024, code: "file_empty" },
    { label: "negative size", size: -1, max: 1_024, code: "file_empty" },
    { label: "fractional size", size: 1.5, max: 1_024, code: "file_empty" },
  ])("$label → $code", ({ size, max, code }) => {
    expect(codeOf(() => checkFileSize(size, max))).toBe(code);
  });

  it("names both sizes in the refusal", () => {
    // 61 234 567 B = 61.2 MB; 50 000 000 B = 50 MB (SI prefixes)
    expect(() => checkFileSize(61_234_567, 50_000_000, '"run-4102.pdf"')).toThrow('"run-4102.pdf" is 61.2 MB; the limit is 50 MB per file');
  });
});

describe("ATTACHMENT_MAX_BYTES", () => {
  it.each([
    { label: "unset", setting: undefined, bytes: 50_000_000 },
    { label: "blank", setting: "  ", bytes: 50_000_000 },
    { label: "one mebibyte", setting: "1048576", bytes: 1_048_576 }, // 2^20 (IEC 80000-13)
    { label: "padded", setting: " 2000 ", bytes: 2_000 },
  ])("$label → $bytes", ({ setting, bytes }) => {
    expect(parseMaxBytes(setting)).toBe(bytes);
  });

  it.each([
    { label: "with a unit", setting: "50MB" },
    { label: "zero", setting: "0" },
    { label: "negative", setting: "-5" },
    { label: "fraction", setting: "10.5" },
    { label: "beyond 2^53", setting: "9007199254740993" }, // Number.MAX_SAFE_INTEGER + 2 (ECMA-262 §21.1.2.6)
  ])("refuses $label", ({ setting }) => {
    expect(codeOf(() => parseMaxBytes(setting))).toBe("invalid_limit");
  });
});

describe("byte counts in words (SI prefixes: k = 10^3, M = 10^6, G = 10^9; BIPM SI Brochure)", () => {
  it.each([
    { bytes: 0, text: "0 B" },
    { bytes: 999, text: "999 B" },
    { bytes: 1_000, text: "1 kB" },
    { bytes: 1_530_000, text: "1.5 MB" },
    { bytes: 50_000_000, text: "50 MB" },
    { bytes: 123_456_789, text: "123 MB" },
    { bytes: 2_500_000_000, text: "2.5 GB" },
    { bytes: -1, text: "—" },
  ])("$bytes → $text", ({ bytes, text }) => {
    expect(formatBytes(bytes)).toBe(text);
  });
});

describe("extensions", () => {
  it.each([
    { name: "plot.PNG", ext: "png" },
    { name: "archive.tar.gz", ext: "gz" },
    { name: ".bashrc", ext: "" }, // a leading dot marks a hidden file, not an extension (POSIX shell convention, common practice)
    { name: "README", ext: "" },
    { name: "dir.v2/file", ext: "" },
  ])("$name → '$ext'", ({ name, ext }) => {
    expect(extensionOf(name)).toBe(ext);
  });
});
