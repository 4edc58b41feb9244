/**
 * Demo scenario part: four weeks of logbook entries at the Kestrin Deep Site, of every category, by the demo crew,
 * linked to the seeded runs where they exist. Shift summaries are filled-in handover templates; some entries have a
 * second revision. Adds nothing when the logbook already holds entries.
 */
import { asc } from "drizzle-orm";
import type { Database } from "../client";
import { runs, type EntryCategory, type RunType } from "../schema";
import { anyEntries, createEntry, reviseEntry } from "../entries";
import { handoverTemplate, handoverTitle, OPEN_ISSUE_PROMPT } from "../../lib/logbook/handover";
import { DAY_MS, REPAIR_DAY, RESTORE_DAY, scenarioStartFor, storedScenarioStart } from "./scenario";
import { LOGBOOK_NOTES, SHIFT_NOTES, type DemoNote } from "../entry-demo-notes";

type SeedRun = { number: number; type: RunType; startMs: number };

const HOUR_MS = 3_600_000;

/** Tick the template's checklist lines that have an answer, appending the answer; add the open issues at the end. */
export function fillHandover(template: string, answers: Record<string, string>, openIssues: string[]): string {
  const lines = template.split("\n").flatMap((line) => {
    if (line === `- [ ] ${OPEN_ISSUE_PROMPT}`) return openIssues.length ? openIssues.map((i) => `- [ ] ${i}`) : ["- [x] Nothing open."];
    const key = Object.keys(answers).find((k) => line.startsWith("- [ ] ") && line.includes(k));
    return key ? [`- [x] ${line.slice(6)} — ${answers[key]}`] : [line];
  });
  return lines.join("\n");
}

function runsBetween(all: SeedRun[], fromMs: number, toMs: number): number[] {
  return all.filter((r) => r.startMs >= fromMs && r.startMs < toMs).map((r) => r.number);
}

/** The `count` runs of a type that started closest to (and before) a note, within three days; sorted by number. */
function runsBefore(all: SeedRun[], atMs: number, count: number, type?: RunType): number[] {
  return all
    .filter((r) => r.startMs <= atMs && atMs - r.startMs < 3 * DAY_MS && (!type || r.type === type))
    .sort((a, b) => b.startMs - a.startMs)
    .slice(0, count)
    .map((r) => r.number)
    .sort((a, b) => a - b);
}

/** Seed the logbook part of the demo scenario; adds only what is missing. */
export async function seedLogbook(db: Database, people: Map<string, number>): Promise<string> {
  if (await anyEntries(db)) return "logbook: entries already there, none added";
  const startMs = (await storedScenarioStart(db)) ?? scenarioStartFor(Date.now());
  const nowMs = Date.now();
  const seeded: SeedRun[] = (await db.select({ number: runs.number, type: runs.type, startAt: runs.startAt }).from(runs).orderBy(asc(runs.number))).map(
    (r) => ({ number: r.number, type: r.type, startMs: r.startAt.getTime() }),
  );
  const who = (email: string): number => {
    const id = people.get(email);
    if (id === undefined) throw new Error(`demo person ${email} is missing; seed the people first`);
    return id;
  };

  let entryCount = 0;
  let revisionCount = 0;
  const write = async (note: DemoNote, atMs: number, runNumbers: number[]) => {
    if (atMs > nowMs) return; // the scenario ends now; nothing is written in the future
    const saved = await createEntry(
      { userId: who(note.author) },
      { category: note.category, title: note.title, body: note.body, tags: note.tags, runNumbers, needsSafetyReview: note.needsSafetyReview ?? false },
      { at: new Date(atMs) },
    );
    entryCount++;
    if (note.revision) {
      const r = note.revision;
      const reviseAt = Math.min(atMs + r.afterHours * HOUR_MS, nowMs);
      await reviseEntry(
        { userId: who(r.author ?? note.author) },
        saved.entryId,
        { baseRevision: 1, title: r.title ?? note.title, body: r.body ?? `${note.body}\n${r.append ?? ""}`, tags: r.tags ?? note.tags, runNumbers },
        { at: new Date(reviseAt) },
      );
      revisionCount++;
    }
  };

  // Shift summaries every other day, alternating night and morning shifts, from the handover template.
  for (const [i, shift] of SHIFT_NOTES.entries()) {
    const day = 1 + i * 2;
    const shiftStart = startMs + day * DAY_MS + (i % 2 === 0 ? -2 : 6) * HOUR_MS;
    const at = shiftStart + 7.75 * HOUR_MS;
    const taken = runsBetween(seeded, shiftStart, shiftStart + 8 * HOUR_MS).slice(0, 6);
    const template = handoverTemplate({ at: new Date(at), writer: shift.writerName, runNumbers: taken });
    const body = fillHandover(template, shift.answers(day < REPAIR_DAY ? "950" : day < RESTORE_DAY ? "948.5" : "950"), shift.openIssues);
    await write(
      { category: "shift_summary", author: shift.author, title: handoverTitle(new Date(at)), body, tags: ["handover"], revision: shift.revision },
      at,
      taken,
    );
  }

  // The other notes, on their scenario day and hour, linked to runs of the named type on that day.
  for (const note of LOGBOOK_NOTES) {
    const at = startMs + note.day * DAY_MS + note.hour * HOUR_MS;
    const linked = note.linkRuns ? runsBefore(seeded, at, note.linkRuns.count, note.linkRuns.type) : [];
    await write(note, at, linked);
  }
  const categories = new Set<EntryCategory>([...LOGBOOK_NOTES.map((n) => n.category), "shift_summary"]);
  return `logbook: ${entryCount} entries (${revisionCount} with a second revision) in ${categories.size} categories, ${seeded.length ? "linked to seeded runs" : "no runs to link yet"}`;
}
