/**
 * The shift-handover template: a markdown checklist the outgoing crew fills in for the next shift.
 * It is only a starting text; the writer edits it freely in the editor.
 */

export type HandoverContext = {
  /** When the handover is written (UTC). */
  at: Date;
  /** Who writes it, for the "handed over by" line. */
  writer?: string;
  /** Run numbers taken during the shift, if known. */
  runNumbers?: number[];
};

/** The shift a UTC time falls in: three 8-hour shifts starting 06:00, 14:00 and 22:00 UTC (the site's rota). */
export function shiftOf(at: Date): { name: "morning" | "afternoon" | "night"; startsAt: Date; endsAt: Date } {
  const hour = at.getUTCHours();
  const day = Date.UTC(at.getUTCFullYear(), at.getUTCMonth(), at.getUTCDate());
  const H = 3_600_000;
  if (hour >= 6 && hour < 14) return { name: "morning", startsAt: new Date(day + 6 * H), endsAt: new Date(day + 14 * H) };
  if (hour >= 14 && hour < 22) return { name: "afternoon", startsAt: new Date(day + 14 * H), endsAt: new Date(day + 22 * H) };
  // The night shift runs over midnight: before 06:00 it began the previous evening.
  const start = hour >= 22 ? day + 22 * H : day - 2 * H;
  return { name: "night", startsAt: new Date(start), endsAt: new Date(start + 8 * H) };
}

/** The placeholder line under "Open issues"; the writer replaces it with one checklist item per issue. */
export const OPEN_ISSUE_PROMPT = "What is still open, where, and who knows more";

const hhmm = (d: Date) => d.toISOString().slice(11, 16);
const ymd = (d: Date) => d.toISOString().slice(0, 10);

/** The title of a handover entry, e.g. "Shift handover 2025-03-04 night (22:00–06:00 UTC)". */
export function handoverTitle(at: Date): string {
  const s = shiftOf(at);
  return `Shift handover ${ymd(s.startsAt)} ${s.name} (${hhmm(s.startsAt)}–${hhmm(s.endsAt)} UTC)`;
}

/** The markdown body of a handover: one checklist section per thing the next shift must know. */
export function handoverTemplate(ctx: HandoverContext): string {
  const s = shiftOf(ctx.at);
  const runs = ctx.runNumbers?.length ? ctx.runNumbers.map((n) => `run ${n}`).join(", ") : "run numbers, type, live time (s)";
  const lines = [
    `## Shift ${ymd(s.startsAt)} ${s.name}, ${hhmm(s.startsAt)}–${hhmm(s.endsAt)} UTC`,
    "",
    ctx.writer ? `Handed over by ${ctx.writer}.` : "Handed over by: ",
    "",
    "### Detector state",
    "- [ ] Quillon TPC: drift and extraction fields at nominal, PMT bias on",
    "- [ ] Quillon-Ge: bias on, leakage current in range",
    "- [ ] DAQ: trigger rate, dead time and disk buffer checked",
    "",
    "### Runs taken",
    `- [ ] ${runs}`,
    "- [ ] Runs stopped early and why",
    "",
    "### Alarms",
    "- [ ] Alarms raised this shift (time UTC, subsystem, what was done)",
    "- [ ] Alarms still active at handover",
    "",
    "### Cryogenics readings",
    "- [ ] Xenon vessel pressure (bar) and liquid level (mm)",
    "- [ ] Cold head temperature (K) and LN2 reserve (%)",
    "- [ ] Oxygen monitors in the cavern (% O2) all normal",
    "",
    "### Calibration sources",
    "- [ ] Sources in use (isotope, serial, where)",
    "- [ ] Sources returned to the store and logged in",
    "",
    "### Open issues for the next shift",
    `- [ ] ${OPEN_ISSUE_PROMPT}`,
    "",
  ];
  return lines.join("\n");
}
