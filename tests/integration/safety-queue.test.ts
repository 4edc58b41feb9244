/**
 * The safety review queue against the running app, its database and the SMTP fake: entries enter the queue
 * (through the logbook API, and through the hook directly), officers are mailed, only safety officers move items
 * and every move needs a comment, an edit after acknowledgement re-opens, a follow-up request mails the writer.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, entries, entryRevisions, safetyReviews } from "@/db/schema";
import { afterEntrySaved } from "@/lib/server/entry-hooks";
import { signIn, type Session } from "../support/http";
import { waitForMail } from "../support/mail";
import { makePerson, type TestPerson } from "../support/people";

const tag = () => randomBytes(4).toString("hex");
const json = (body: unknown, method = "POST"): RequestInit => ({ method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

type Item = { reviewId: number; entryId: number; state: string; title: string; ageMs: number };

let officer: TestPerson;
let writer: TestPerson;
let officerS: Session;
let writerS: Session;
let expertS: Session;

async function newEntry(s: Session, over: Record<string, unknown> = {}) {
  const title = `LN2 dewar vent frosted over ${tag()}`;
  const res = await s.fetch("/api/entries", json({ category: "cryogenics", title, body: "Vent line on dewar 3 iced up during the fill.", tags: [], runNumbers: [], needsSafetyReview: false, ...over }));
  expect(res.status).toBe(201);
  const body = (await res.json()) as { id: number; revision: number };
  return { id: body.id, title };
}

async function itemFor(entryId: number): Promise<Item | undefined> {
  const res = await officerS.fetch(`/api/safety/reviews?entryId=${entryId}`);
  expect(res.status).toBe(200);
  return ((await res.json()) as { items: Item[] }).items[0];
}

const move = (s: Session, reviewId: number, body: unknown) => s.fetch(`/api/safety/reviews/${reviewId}/moves`, json(body));

beforeAll(async () => {
  officer = await makePerson(["safety_officer"], "officer");
  writer = await makePerson(["shift_crew"], "crew");
  const expert = await makePerson(["detector_expert"], "expert");
  [officerS, writerS, expertS] = await Promise.all([signIn(officer.email, officer.password), signIn(writer.email, writer.password), signIn(expert.email, expert.password)]);
});

afterAll(async () => {
  await closeDb();
});

describe("a new safety entry", () => {
  it("enters the queue as awaiting review and the safety officers get an e-mail", async () => {
    const e = await newEntry(writerS);
    const item = await itemFor(e.id);
    expect(item?.state).toBe("awaiting_review");
    expect(item?.title).toBe(e.title);
    const mail = await waitForMail(officer.email, new RegExp(`Safety review needed: ${e.title}`));
    expect(mail.text).toContain(`/logbook/${e.id}`);
  });

  it("a run note is not queued unless its writer marks it for safety review", async () => {
    const plain = await newEntry(writerS, { category: "run_note" });
    const marked = await newEntry(writerS, { category: "run_note", needsSafetyReview: true });
    expect(await itemFor(plain.id)).toBeUndefined();
    expect((await itemFor(marked.id))?.state).toBe("awaiting_review");
  });

  it("the queue lists open items oldest first with counts by state", async () => {
    const res = await officerS.fetch("/api/safety/reviews?state=open&category=cryogenics");
    const body = (await res.json()) as { items: Item[]; counts: Record<string, number> };
    const ages = body.items.map((i) => i.ageMs);
    expect(ages).toEqual([...ages].sort((a, b) => b - a));
    expect(body.items.every((i) => ["awaiting_review", "follow_up"].includes(i.state))).toBe(true);
    expect(body.counts.awaiting_review).toBeGreaterThanOrEqual(1);
  });
});

describe("moving an item", () => {
  it("only safety officers may; each move needs a comment; the move lands in the trail and the audit", async () => {
    const e = await newEntry(writerS);
    const item = (await itemFor(e.id))!;
    expect((await move(writerS, item.reviewId, { to: "acknowledged", comment: "fine" })).status).toBe(403);
    expect((await move(expertS, item.reviewId, { to: "acknowledged", comment: "fine" })).status).toBe(403);
    expect((await writerS.fetch(`/api/safety/reviews?entryId=${e.id}`)).status).toBe(403);

    const noComment = await move(officerS, item.reviewId, { to: "acknowledged", comment: "   " });
    expect(noComment.status).toBe(400);
    expect(((await noComment.json()) as { field: string }).field).toBe("comment");
    const missing = await move(officerS, item.reviewId, { to: "acknowledged" });
    expect(missing.status).toBe(400);

    const ok = await move(officerS, item.reviewId, { to: "acknowledged", comment: "Checked with the shift; ODH monitors normal." });
    expect(ok.status).toBe(200);
    expect(await ok.json()).toEqual({ id: item.reviewId, from: "awaiting_review", state: "acknowledged" });

    // Acknowledged is an end state for officers: closing it is refused (409 naming the field).
    const again = await move(officerS, item.reviewId, { to: "closed", comment: "x" });
    expect(again.status).toBe(409);
    expect(((await again.json()) as { field: string }).field).toBe("to");

    const detail = (await (await officerS.fetch(`/api/safety/reviews/${item.reviewId}`)).json()) as { events: { toState: string; comment: string }[] };
    expect(detail.events.map((ev) => ev.toState)).toEqual(["awaiting_review", "acknowledged"]);
    expect(detail.events[1]?.comment).toBe("Checked with the shift; ODH monitors normal.");
    const audits = await db.select().from(auditEvents).where(eq(auditEvents.recordId, String(item.reviewId)));
    expect(audits.some((a) => a.action === "safety.review.move" && a.actorUserId === officer.id)).toBe(true);
  });

  it("an edit after acknowledgement puts the item back to awaiting review and mails the officers", async () => {
    const e = await newEntry(writerS);
    const item = (await itemFor(e.id))!;
    expect((await move(officerS, item.reviewId, { to: "acknowledged", comment: "Read." })).status).toBe(200);
    const edit = await writerS.fetch(`/api/entries/${e.id}`, json({ baseRevision: 1, title: e.title, body: "Vent line iced up; cleared with a heat gun.", tags: [], runNumbers: [] }, "PUT"));
    expect(edit.status).toBe(200);
    expect(((await edit.json()) as { revision: number }).revision).toBe(2);
    expect((await itemFor(e.id))?.state).toBe("awaiting_review");
    const detail = (await (await officerS.fetch(`/api/safety/reviews/${item.reviewId}`)).json()) as { events: { comment: string }[] };
    expect(detail.events.at(-1)?.comment).toBe("re-opened by revision 2");
    await waitForMail(officer.email, new RegExp(`re-opened \\(revision 2\\): ${e.title}`));
  });

  it("asking for follow-up mails the writer with the comment; closing then ends it", async () => {
    const e = await newEntry(writerS, { category: "incident" });
    const item = (await itemFor(e.id))!;
    const ask = await move(officerS, item.reviewId, { to: "follow_up", comment: "Add the oxygen readings from the hall monitor." });
    expect(ask.status).toBe(200);
    const mail = await waitForMail(writer.email, new RegExp(`Follow-up needed on your entry: ${e.title}`));
    expect(mail.text).toContain("Add the oxygen readings from the hall monitor.");
    expect((await move(officerS, item.reviewId, { to: "closed", comment: "Readings added." })).status).toBe(200);
    expect((await itemFor(e.id))?.state).toBe("closed");
  });
});

describe("the hook called directly (as the logbook does after each saved revision)", () => {
  async function insertEntry(category: "cryogenics" | "maintenance", title: string): Promise<number> {
    const [res] = await db.insert(entries).values({ category, authorId: writer.id, currentRevision: 1 });
    await db.insert(entryRevisions).values({ entryId: res.insertId, revision: 1, title, body: "", tags: [], runNumbers: [], authorId: writer.id });
    return res.insertId;
  }

  it("enqueues once however often it is called, and a stale revision does not re-open", async () => {
    const title = `Argon bottle regulator leak ${tag()}`;
    const entryId = await insertEntry("cryogenics", title);
    const saved = { entryId, revision: 1, category: "cryogenics", title, needsSafetyReview: false, authorId: writer.id };
    await afterEntrySaved(saved);
    await afterEntrySaved(saved);
    const rows = await db.select().from(safetyReviews).where(eq(safetyReviews.entryId, entryId));
    expect(rows).toHaveLength(1);
    const reviewId = rows[0]!.id;
    expect((await move(officerS, reviewId, { to: "acknowledged", comment: "Read." })).status).toBe(200);
    // The revision the officer saw (1) arriving again changes nothing.
    await afterEntrySaved(saved);
    expect((await itemFor(entryId))?.state).toBe("acknowledged");
  });

  it("a maintenance entry not marked for review stays out of the queue", async () => {
    const title = `Pump oil change ${tag()}`;
    const entryId = await insertEntry("maintenance", title);
    await afterEntrySaved({ entryId, revision: 1, category: "maintenance", title, needsSafetyReview: false, authorId: writer.id });
    expect(await db.select().from(safetyReviews).where(eq(safetyReviews.entryId, entryId))).toHaveLength(0);
  });
});
