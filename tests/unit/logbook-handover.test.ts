import { describe, it, expect } from "vitest";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import ReactMarkdown from "react-markdown";
import remarkGfm from "remark-gfm";
import { handoverTemplate, handoverTitle, OPEN_ISSUE_PROMPT, shiftOf } from "@/lib/logbook/handover";

// The site's rota, a product convention: three 8-hour shifts from 06:00, 14:00 and 22:00 UTC.
describe("which shift a time falls in", () => {
  it.each([
    { label: "start of the morning shift", at: "2025-03-04T06:00:00Z", name: "morning", starts: "2025-03-04T06:00:00.000Z" },
    { label: "last minute of the morning", at: "2025-03-04T13:59:59Z", name: "morning", starts: "2025-03-04T06:00:00.000Z" },
    { label: "start of the afternoon", at: "2025-03-04T14:00:00Z", name: "afternoon", starts: "2025-03-04T14:00:00.000Z" },
    { label: "night before midnight", at: "2025-03-04T23:30:00Z", name: "night", starts: "2025-03-04T22:00:00.000Z" },
    { label: "night after midnight belongs to the evening before", at: "2025-03-05T03:00:00Z", name: "night", starts: "2025-03-04T22:00:00.000Z" },
    { label: "night across a month end", at: "2025-03-01T01:00:00Z", name: "night", starts: "2025-02-28T22:00:00.000Z" }, // 2025 is not a leap year (Gregorian calendar)
  ])("$label → $name from $starts", ({ at, name, starts }) => {
    const s = shiftOf(new Date(at));
    expect(s.name).toBe(name);
    expect(s.startsAt.toISOString()).toBe(starts);
    expect(s.endsAt.getTime() - s.startsAt.getTime()).toBe(8 * 3_600_000); // 8 h shifts
  });

  it.each([
    { at: "2025-03-05T03:00:00Z", title: "Shift handover 2025-03-04 night (22:00–06:00 UTC)" },
    { at: "2025-03-04T10:15:00Z", title: "Shift handover 2025-03-04 morning (06:00–14:00 UTC)" },
    { at: "2025-03-04T21:59:00Z", title: "Shift handover 2025-03-04 afternoon (14:00–22:00 UTC)" },
  ])("title at $at", ({ at, title }) => {
    expect(handoverTitle(new Date(at))).toBe(title);
  });
});

describe("the handover checklist", () => {
  const at = new Date("2025-03-05T05:40:00Z");
  const body = handoverTemplate({ at, writer: "Mara Velen", runNumbers: [41020, 41021] });
  const items = body.split("\n").filter((l) => l.startsWith("- [ ] "));

  it.each(["### Detector state", "### Runs taken", "### Alarms", "### Cryogenics readings", "### Calibration sources", "### Open issues for the next shift"])(
    "has the section %s",
    (heading) => {
      expect(body.split("\n")).toContain(heading);
    },
  );

  it("names the shift, the writer and the runs taken", () => {
    expect(body.startsWith("## Shift 2025-03-04 night, 22:00–06:00 UTC\n")).toBe(true);
    expect(body).toContain("Handed over by Mara Velen.");
    expect(body).toContain("- [ ] run 41020, run 41021");
    expect(body).toContain(`- [ ] ${OPEN_ISSUE_PROMPT}`);
  });

  it("renders every checklist line as an unticked GFM task item (GFM spec 0.29 §5.3, via remark-gfm)", () => {
    const html = renderToStaticMarkup(createElement(ReactMarkdown, { remarkPlugins: [remarkGfm] }, body));
    const boxes = html.match(/<input type="checkbox" disabled=""\/>/g) ?? [];
    expect(items.length).toBeGreaterThanOrEqual(12);
    expect(boxes).toHaveLength(items.length);
    expect(html).not.toContain("[ ]"); // no item left as literal brackets
    expect(html).not.toContain(`checked=""`);
  });

  it("asks for the run numbers when none are known", () => {
    expect(handoverTemplate({ at })).toContain("- [ ] run numbers, type, live time (s)");
    expect(handoverTemplate({ at })).toContain("Handed over by: ");
  });
});
