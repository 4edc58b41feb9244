/**
 * Logbook entries against the running app and its database: create, revise, stale edit, validation, full-text
 * search over current revisions, feed filters, retraction (admin only) and the audit trail.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, entryRevisions } from "@/db/schema";
import { APP_URL, signIn, type Session } from "../support/http";
import { makePerson } from "../support/people";

// A word that occurs in no other entry: letters only, long enough for the full-text index (min token size 3).
const uniqueWord = () => `quillonmark${randomBytes(5).toString("hex").replace(/\d/g, (d) => "abcdefghij"[Number(d)]!)}`;

let crew: Session;
let admin: Session;
let otherCrew: Session;

const json = (body: unknown): RequestInit => ({ method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
const put = (body: unknown): RequestInit => ({ ...json(body), method: "PUT" });

async function createEntry(s: Session, over: Record<string, unknown> = {}) {
  const res = await s.fetch("/api/entries", json({ category: "detector", title: "PMT 14 gain drift", body: "Gain of PMT 14 is 3 % low.", tags: ["PMT", "gain"], runNumbers: [], needsSafetyReview: false, ...over }));
  return { res, body: (await res.json()) as { id: number; revision: number; error?: string; field?: string } };
}

beforeAll(async () => {
  const c = await makePerson(["shift_crew"], "crew");
  const o = await makePerson(["detector_expert"], "expert");
  const a = await makePerson(["admin"], "admin");
  [crew, otherCrew, admin] = await Promise.all([signIn(c.email, c.password), signIn(o.email, o.password), signIn(a.email, a.password)]);
});

afterAll(async () => {
  await closeDb();
});

describe("create and read", () => {
  it("POST /api/entries answers 201 {id, revision: 1} and the entry reads back normalised", async () => {
    const { res, body } = await createEntry(crew, { tags: " PMT, gain ,pmt", runNumbers: "4102, 4101 4102" });
    expect(res.status).toBe(201);
    expect(body.revision).toBe(1);
    const got = await crew.fetch(`/api/entries/${body.id}`);
    expect(got.status).toBe(200);
    const entry = (await got.json()) as { title: string; tags: string[]; runNumbers: number[]; revisions: unknown[]; currentRevision: number };
    expect(entry.title).toBe("PMT 14 gain drift");
    expect(entry.tags).toEqual(["pmt", "gain"]); // lower-cased, duplicates dropped, order kept
    expect(entry.runNumbers).toEqual([4101, 4102]); // sorted, duplicates dropped
    expect(entry.revisions).toHaveLength(1);
    expect(entry.currentRevision).toBe(1);
  });

  it.each([
    { label: "missing title", over: { title: "" }, field: "title" },
    { label: "unknown category", over: { category: "coffee" }, field: "category" },
    { label: "run number that is not a number", over: { runNumbers: "41o2" }, field: "runNumbers" },
    { label: "tag with a slash in it", over: { tags: ["ok", "bad/tag"] }, field: "tags" },
  ])("400 names the field for $label", async ({ over, field }) => {
    const { res, body } = await createEntry(crew, over);
    expect(res.status).toBe(400);
    expect(body.field).toBe(field);
    expect(body.error).toMatch(/\w{4,}/);
  });

  it("refuses readers who are not signed in (401)", async () => {
    const res = await fetch(`${APP_URL}/api/entries`);
    expect(res.status).toBe(401);
  });
});

describe("revisions", () => {
  it("an edit from the newest revision adds revision 2 and flips is_current; a stale edit gets 409 with currentRevision", async () => {
    const { body: created } = await createEntry(crew);
    const edit = { baseRevision: 1, title: "PMT 14 gain drift (recalibrated)", body: "Gain of PMT 14 restored after HV step.", tags: ["pmt"], runNumbers: [4103] };
    const first = await otherCrew.fetch(`/api/entries/${created.id}`, put(edit));
    expect(first.status).toBe(200);
    expect(((await first.json()) as { revision: number }).revision).toBe(2);

    const stale = await crew.fetch(`/api/entries/${created.id}`, put({ ...edit, title: "my late edit" }));
    expect(stale.status).toBe(409);
    const conflict = (await stale.json()) as { error: string; currentRevision: number };
    expect(conflict.currentRevision).toBe(2);
    expect(conflict.error).toMatch(/revision 2/);

    const rows = await db.select().from(entryRevisions).where(eq(entryRevisions.entryId, created.id));
    expect(rows.map((r) => [r.revision, r.isCurrent]).sort()).toEqual([
      [1, false],
      [2, true],
    ]);
    const entry = (await (await crew.fetch(`/api/entries/${created.id}`)).json()) as { title: string; revisions: { revision: number; title: string }[]; runNumbers: number[] };
    expect(entry.title).toBe("PMT 14 gain drift (recalibrated)");
    expect(entry.revisions.map((r) => r.title)).toEqual(["PMT 14 gain drift", "PMT 14 gain drift (recalibrated)"]);
    expect(entry.runNumbers).toEqual([4103]);
  });
});

describe("feed and full-text search", () => {
  it("finds an entry by a unique word of its current revision only", async () => {
    const oldWord = uniqueWord();
    const newWord = uniqueWord();
    const { body: created } = await createEntry(crew, { title: `Xenon purity ${oldWord}`, body: "Electron lifetime 812 µs." });
    const hits = async (q: string) => {
      const res = await crew.fetch(`/api/entries?q=${encodeURIComponent(q)}`);
      expect(res.status).toBe(200);
      return ((await res.json()) as { entries: { id: number }[] }).entries.map((e) => e.id);
    };
    expect(await hits(oldWord)).toEqual([created.id]);
    await crew.fetch(`/api/entries/${created.id}`, put({ baseRevision: 1, title: "Xenon purity", body: `Electron lifetime 830 µs, ${newWord}.`, tags: [], runNumbers: [] }));
    expect(await hits(oldWord)).toEqual([]); // only current revisions are searched
    expect(await hits(newWord)).toEqual([created.id]);
    expect(await hits(`lifetime ${newWord}`)).toEqual([created.id]); // every word must appear
  });

  it("filters by category, tag, run and author together", async () => {
    const tag = uniqueWord().slice(0, 30);
    const run = 900_000 + Math.floor(Math.random() * 99_999);
    const { body: created } = await createEntry(crew, { category: "calibration", tags: [tag], runNumbers: [run] });
    const me = (await (await crew.fetch(`/api/entries/${created.id}`)).json()) as { authorId: number };
    const res = await crew.fetch(`/api/entries?category=calibration&tag=${tag}&run=${run}&author=${me.authorId}`);
    const page = (await res.json()) as { entries: { id: number }[]; total: number };
    expect(page.entries.map((e) => e.id)).toEqual([created.id]);
    const wrongCategory = (await (await crew.fetch(`/api/entries?category=incident&tag=${tag}`)).json()) as { total: number };
    expect(wrongCategory.total).toBe(0);
    const bad = await crew.fetch(`/api/entries?from=yesterday`);
    expect(bad.status).toBe(400);
  });
});

describe("retraction", () => {
  it("a non-admin gets 403; an admin retracts with a reason, which stays visible and audited", async () => {
    const { body: created } = await createEntry(crew);
    const refused = await crew.fetch(`/api/entries/${created.id}/retract`, json({ reason: "duplicate of another entry" }));
    expect(refused.status).toBe(403);

    const done = await admin.fetch(`/api/entries/${created.id}/retract`, json({ reason: "duplicate of another entry" }));
    expect(done.status).toBe(200);
    const entry = (await (await crew.fetch(`/api/entries/${created.id}`)).json()) as { retractedAt: string | null; retractReason: string };
    expect(entry.retractedAt).not.toBeNull();
    expect(entry.retractReason).toBe("duplicate of another entry");

    const trail = await db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "entry"), eq(auditEvents.recordId, String(created.id))));
    expect(trail.map((a) => a.action).sort()).toEqual(["entry.create", "entry.retract"]);

    const edit = await crew.fetch(`/api/entries/${created.id}`, put({ baseRevision: 1, title: "still here?", body: "", tags: [], runNumbers: [] }));
    expect(edit.status).toBe(409);
    const again = await admin.fetch(`/api/entries/${created.id}/retract`, json({ reason: "second time" }));
    expect(again.status).toBe(409);
  });

  it("a retraction without a reason is refused (400, field reason)", async () => {
    const { body: created } = await createEntry(crew);
    const res = await admin.fetch(`/api/entries/${created.id}/retract`, json({ reason: " " }));
    expect(res.status).toBe(400);
    expect(((await res.json()) as { field: string }).field).toBe("reason");
  });
});
