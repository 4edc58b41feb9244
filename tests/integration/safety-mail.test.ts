/**
 * Safety mail that does not come from a page: the digest of items open > 24 h (the digest job run with a later
 * clock, at most one per officer per day; only that job, so the other jobs' notices are not spent early), and the outbox keeping a message while the SMTP server is down.
 */
import { randomBytes } from "node:crypto";
import { createServer } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { entries, entryRevisions, outbox } from "@/db/schema";
import { afterEntrySaved } from "@/lib/server/entry-hooks";
import { queueDigest } from "@/lib/server/safety-jobs";
import { flushOutbox, resetSmtpTransportForTests, sendMail } from "@/lib/server/mailer";
import { allMail, waitForMail } from "../support/mail";
import { makePerson, type TestPerson } from "../support/people";

const HOUR_MS = 3_600_000;
const tag = () => randomBytes(4).toString("hex");

let officer: TestPerson;
let writer: TestPerson;

/** A port nothing listens on: bind an ephemeral one, then close it. */
async function closedPort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const addr = srv.address();
      const port = typeof addr === "object" && addr ? addr.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

/** Send everything waiting (the mailer sends 50 per flush, oldest first). */
async function drainOutbox(): Promise<void> {
  for (let i = 0; i < 40; i++) if ((await flushOutbox()).sent === 0) return;
}

beforeAll(async () => {
  officer = await makePerson(["safety_officer"], "officer");
  writer = await makePerson(["shift_crew"], "crew");
});

afterAll(async () => {
  resetSmtpTransportForTests();
  await closeDb();
});

describe("daily digest", () => {
  it("lists items open longer than 24 h, once per officer per day", async () => {
    const title = `Xenon recovery vessel overpressure alarm ${tag()}`;
    const [res] = await db.insert(entries).values({ category: "incident", authorId: writer.id, currentRevision: 1 });
    await db.insert(entryRevisions).values({ entryId: res.insertId, revision: 1, title, body: "", tags: [], runNumbers: [], authorId: writer.id });
    await afterEntrySaved({ entryId: res.insertId, revision: 1, category: "incident", title, needsSafetyReview: false, authorId: writer.id });

    // A clock some days ahead (a different day on every run) so the item is > 24 h old and the day's key is fresh.
    const later = new Date(Date.now() + 25 * HOUR_MS + Math.floor(Math.random() * 3000) * 24 * HOUR_MS);
    expect(await queueDigest(later)).toMatch(/open > 24 h, [1-9]\d* digest/);
    await drainOutbox();
    const day = later.toISOString().slice(0, 10);
    const mail = await waitForMail(officer.email, new RegExp(`Safety queue digest ${day}`));
    expect(mail.text).toContain(title);

    expect(await queueDigest(new Date(later.getTime() + 60_000))).toMatch(/, 0 digest/);
    await drainOutbox();
    const mine = (await allMail()).filter((m) => m.to.includes(officer.email) && m.subject.startsWith(`Safety queue digest ${day}`));
    expect(mine).toHaveLength(1);
  });

  it("sends nothing while no item is older than 24 h", async () => {
    // Far in the past, before any item entered the queue.
    expect(await queueDigest(new Date("2001-01-01T00:00:00Z"))).toBe("no item open longer than 24 h");
  });
});

describe("outbox while the mail server is down", () => {
  it("keeps the message, then sends it once the server is back", async () => {
    const to = `outbox-${tag()}@test.kestrin-deep.example`;
    const subject = `Outbox check ${tag()}`;
    // Clear what waits first, so this message is among those the next flush tries.
    await drainOutbox();
    const realPort = process.env.SMTP_PORT;
    process.env.SMTP_PORT = String(await closedPort());
    resetSmtpTransportForTests();
    try {
      await sendMail({ kind: "test", to, subject, text: "Kept while the server is down." });
    } finally {
      if (realPort === undefined) delete process.env.SMTP_PORT;
      else process.env.SMTP_PORT = realPort;
      resetSmtpTransportForTests();
    }
    const [kept] = await db.select().from(outbox).where(eq(outbox.toAddress, to));
    expect(kept?.sentAt).toBeNull();
    expect(kept?.attempts).toBeGreaterThanOrEqual(1);
    expect(kept?.lastError).toBeTruthy();

    await drainOutbox();
    const mail = await waitForMail(to, new RegExp(subject));
    expect(mail.text).toContain("Kept while the server is down.");
    const [sent] = await db.select().from(outbox).where(eq(outbox.toAddress, to));
    expect(sent?.sentAt).toBeInstanceOf(Date);
  });
});
