import { describe, it, expect } from "vitest";
import { contentDisposition, sanitiseFileName } from "@/lib/logbook/file-name";

describe("file names kept as display text", () => {
  it.each([
    { label: "path traversal", raw: "../../etc/passwd.png", clean: "passwd.png" }, // OWASP path traversal (common practice)
    { label: "Windows path", raw: "C:\\Users\\mara\\plot.png", clean: "plot.png" },
    { label: "right-to-left override", raw: "report\u202Egnp.exe", clean: "reportgnp.exe" }, // U+202E RLO, Unicode UAX #9; the "RLO extension spoof" (common practice)
    { label: "NUL and other controls", raw: "a\u0000b\u001f\u007fc.txt", clean: "abc.txt" },
    { label: "zero-width space and BOM", raw: "\ufeffplot\u200b.png", clean: "plot.png" },
    { label: "reserved characters", raw: 'what?<>:"|*.png', clean: "what_______.png" }, // reserved in Windows file names (Microsoft "Naming Files", common practice)
    { label: "runs of spaces", raw: "  PMT   gain\tmap .png  ", clean: "PMT gain map .png" },
    { label: "hidden-file dot", raw: ".hidden", clean: "hidden" },
    { label: "only dots", raw: "...", clean: "attachment" },
    { label: "empty", raw: "", clean: "attachment" },
    { label: "device name", raw: "CON.txt", clean: "_CON.txt" }, // reserved device names (Microsoft "Naming Files")
    { label: "decomposed umlaut", raw: "Mu\u0308ller.pdf", clean: "Müller.pdf" }, // NFC composes u + U+0308 to ü (Unicode UAX #15)
    { label: "ordinary name", raw: "Cs-137 spectrum (run 41030).png", clean: "Cs-137 spectrum (run 41030).png" },
  ])("$label → $clean", ({ raw, clean }) => {
    expect(sanitiseFileName(raw)).toBe(clean);
  });

  it("shortens long names to 120 characters and keeps the extension", () => {
    const clean = sanitiseFileName(`${"x".repeat(200)}.png`);
    expect(Array.from(clean)).toHaveLength(120);
    expect(clean.endsWith("….png")).toBe(true);
    expect(clean.startsWith("x".repeat(115))).toBe(true); // 120 − ".png" (4) − "…" (1) = 115
  });
});

describe("Content-Disposition (RFC 6266 with the RFC 8187 filename* parameter)", () => {
  it.each([
    {
      label: "ASCII name, inline",
      name: "gain-map.png",
      inline: true,
      header: "inline; filename=\"gain-map.png\"; filename*=UTF-8''gain-map.png",
    },
    {
      // ü is C3 BC in UTF-8; space is %20 (RFC 3986 percent-encoding)
      label: "accented name, download",
      name: "Müller plot.pdf",
      inline: false,
      header: "attachment; filename=\"Muller plot.pdf\"; filename*=UTF-8''M%C3%BCller%20plot.pdf",
    },
    {
      // ' ( ) are not attr-chars in RFC 8187 §3.2.1 and are percent-encoded: %27 %28 %29
      label: "quotes and brackets",
      name: "my 'best' (v2).csv",
      inline: false,
      header: "attachment; filename=\"my 'best' (v2).csv\"; filename*=UTF-8''my%20%27best%27%20%28v2%29.csv",
    },
  ])("$label", ({ name, inline, header }) => {
    expect(contentDisposition(name, inline)).toBe(header);
  });
});
