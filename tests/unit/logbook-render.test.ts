import { describe, it, expect } from "vitest";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { EntryBody } from "@/components/logbook/EntryBody";

const render = (markdown: string) => renderToStaticMarkup(createElement(EntryBody, { markdown }));

// Known script-injection shapes (OWASP XSS filter evasion cheat sheet, common practice).
describe("entry text renders inert", () => {
  it.each([
    { label: "raw img with onerror", md: "Before <img src=x onerror=alert(1)> after", absent: ["<img", "onerror"] },
    { label: "script element", md: "<script>alert(2)</script>", absent: ["<script", "alert(2)"] },
    { label: "javascript: link", md: "[x](javascript:alert(1))", absent: ["javascript:", "href"] },
    { label: "mixed-case javascript: link", md: "[x](JaVaScRiPt:alert(1))", absent: ["avascript", "href"] },
    { label: "data: link", md: "[x](data:text/html;base64,PHNjcmlwdD4=)", absent: ["data:", "href"] },
    { label: "picture from elsewhere", md: "![tracker](https://example.org/p.gif)", absent: ["<img"] },
    { label: "iframe", md: '<iframe src="https://example.org"></iframe>', absent: ["<iframe"] },
  ])("$label", ({ md, absent }) => {
    const html = render(md);
    for (const bad of absent) expect(html.toLowerCase()).not.toContain(bad.toLowerCase());
  });

  it.each([
    { label: "bold", md: "Gain of **PMT 14**", present: "<strong>PMT 14</strong>" },
    { label: "own attachment picture", md: "![gain map](/api/attachments/17)", present: '<img src="/api/attachments/17" alt="gain map" loading="lazy"' },
    { label: "https link", md: "[procedure](https://kestrin-deep.example/proc)", present: 'href="https://kestrin-deep.example/proc" rel="noopener noreferrer nofollow" target="_blank"' },
    { label: "table (GFM)", md: "| a | b |\n| - | - |\n| 1 | 2 |", present: "<td>1</td>" },
    { label: "checklist (GFM)", md: "- [x] done", present: '<input type="checkbox" disabled="" checked=""/> done' },
  ])("keeps $label", ({ md, present }) => {
    expect(render(md)).toContain(present);
  });

  it("keeps the link text of a neutralised link", () => {
    expect(render("[x](javascript:alert(1))")).toContain('title="link removed: not a safe address"');
  });
});
