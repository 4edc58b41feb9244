/**
 * Safety notices: the e-mails the review queue and the source inventory send, at once (a new queue item,
 * a follow-up request) or from the scheduled jobs (the daily digest of items open > 24 h, overdue checkouts,
 * leak tests due). Messages go through the outbox with dedupe keys, so a job that runs every minute (or twice
 * at once) sends each notice once; the outbox job sends what is queued.
 */
import { createHash } from "node:crypto";
import { emailsWithRole } from "@/db/users";
import { enqueue } from "@/db/outbox";
import { getQueueItem, openItemsEnteredBefore, userContact, type QueueItem } from "@/db/safety";
import { listSources, markOverdueNotified, openUnnotifiedCheckouts } from "@/db/sources";
import { checkoutStatus } from "@/lib/safety/sources";
import { formatAge } from "@/components/safety/age";
import { REVIEW_STATE_DISPLAY } from "@/components/safety/review-flow";
import { factsFromRow, leakState } from "@/components/safety/source-status";
import { appUrl, flushOutbox } from "./mailer";
import type { Job } from "./jobs";

const HOUR_MS = 3_600_000;
/** Items open longer than this go into the digest. */
export const DIGEST_AFTER_MS = 24 * HOUR_MS;

const CATEGORY_WORDS: Record<string, string> = { cryogenics: "cryogenics", radiation: "radiation", incident: "incident" };

const MAX_KEY = 200; // outbox.dedupe_key is VARCHAR(200)

/** A dedupe key from its parts; hashed when a long address would not fit the column. */
export function dedupeKey(...parts: (string | number)[]): string {
  const key = parts.join(":");
  return key.length <= MAX_KEY ? key : `${String(parts[0])}:${createHash("sha256").update(key).digest("hex")}`;
}

function itemLine(item: QueueItem, nowMs: number): string {
  const age = formatAge(nowMs - item.enteredAt.getTime());
  return `- [${REVIEW_STATE_DISPLAY[item.state].label}, ${age}] ${item.title} (${item.category}, by ${item.authorName})\n  ${appUrl(`/safety/reviews/${item.reviewId}`)}`;
}

async function toOfficers(kind: string, subject: string, text: string, keyFor: (email: string) => string | undefined): Promise<number> {
  let queued = 0;
  for (const to of await emailsWithRole("safety_officer")) {
    const key = keyFor(to);
    if (await enqueue({ kind, to, subject, text, ...(key ? { dedupeKey: key } : {}) })) queued++;
  }
  return queued;
}

/** Tell every safety officer about a new (or re-opened) queue item, and send at once. */
export async function notifyReviewItem(reviewId: number, reopenedByRevision?: number): Promise<number> {
  const item = await getQueueItem({ reviewId });
  if (!item) return 0;
  const why = CATEGORY_WORDS[item.category] ? `a ${item.category} entry` : "an entry marked for safety review";
  const subject = reopenedByRevision
    ? `Safety review re-opened (revision ${reopenedByRevision}): ${item.title}`
    : `Safety review needed: ${item.title}`;
  const text = [
    reopenedByRevision
      ? `${item.authorName} saved revision ${reopenedByRevision} of ${why} that had been reviewed; it is back in the safety queue.`
      : `${item.authorName} wrote ${why}; it is waiting in the safety review queue.`,
    "",
    `Title: ${item.title}`,
    `Category: ${item.category}${item.needsSafetyReview ? " (marked \"needs safety review\")" : ""}`,
    `Entry: ${appUrl(`/logbook/${item.entryId}`)}`,
    `Review: ${appUrl(`/safety/reviews/${item.reviewId}`)}`,
  ].join("\n");
  const key = (email: string) => (reopenedByRevision ? dedupeKey("review-reopen", reviewId, reopenedByRevision, email) : dedupeKey("review-new", reviewId, email));
  const queued = await toOfficers(reopenedByRevision ? "safety.review.reopened" : "safety.review.new", subject, text, key);
  await flushOutbox();
  return queued;
}

/** Tell the entry's writer that a safety officer asked for follow-up, with the comment; send at once. */
export async function notifyFollowUp(reviewId: number, officerName: string, comment: string): Promise<boolean> {
  const item = await getQueueItem({ reviewId });
  if (!item) return false;
  const writer = await userContact(item.authorId);
  if (!writer || !writer.active) return false;
  await enqueue({
    kind: "safety.review.follow_up",
    to: writer.email,
    subject: `Follow-up needed on your entry: ${item.title}`,
    text: [
      `Hello ${writer.displayName},`,
      "",
      `${officerName} (safety officer) reviewed your entry "${item.title}" and asks for follow-up:`,
      "",
      comment,
      "",
      `Please edit the entry (a new revision puts it back in the safety queue): ${appUrl(`/logbook/${item.entryId}`)}`,
    ].join("\n"),
  });
  await flushOutbox();
  return true;
}

/** Queue the daily digest of items open longer than 24 h: at most one per officer per UTC day. */
export async function queueDigest(now: Date): Promise<string> {
  const items = await openItemsEnteredBefore(new Date(now.getTime() - DIGEST_AFTER_MS));
  if (items.length === 0) return "no item open longer than 24 h";
  const day = now.toISOString().slice(0, 10);
  const text = [
    `${items.length} safety review item${items.length === 1 ? " has" : "s have"} been open for more than 24 hours (oldest first):`,
    "",
    ...items.map((i) => itemLine(i, now.getTime())),
    "",
    `The queue: ${appUrl("/safety")}`,
  ].join("\n");
  const queued = await toOfficers("safety.review.digest", `Safety queue digest ${day}: ${items.length} open > 24 h`, text, (email) => dedupeKey("digest", day, email));
  return `${items.length} open > 24 h, ${queued} digest(s) queued`;
}

/** Queue one overdue notice per checkout that is past its allowed time, to every safety officer. */
export async function queueOverdueCheckouts(now: Date): Promise<string> {
  let notices = 0;
  for (const c of await openUnnotifiedCheckouts()) {
    const status = checkoutStatus(c.checkedOutAt.getTime(), c.allowedOutHours * HOUR_MS, now.getTime());
    if (!status.overdue) continue;
    const text = [
      `Calibration source ${c.nuclide} ${c.serial} was checked out by ${c.byName} at ${c.checkedOutAt.toISOString().slice(0, 16).replace("T", " ")} UTC`,
      `for "${c.purpose}" and is ${formatAge(status.overdueByMs)} past its allowed ${c.allowedOutHours} h out. Home location: ${c.location}.`,
      "",
      `Source: ${appUrl(`/safety/sources/${c.sourceId}`)}`,
    ].join("\n");
    notices += await toOfficers("safety.source.overdue", `Overdue: ${c.nuclide} ${c.serial} not returned`, text, (email) => dedupeKey("overdue", c.checkoutId, email));
    await markOverdueNotified(c.checkoutId, now);
  }
  return `${notices} overdue notice(s) queued`;
}

/**
 * Queue one leak-test notice per officer listing every sealed source whose test is due within 30 days, overdue
 * or missing. The dedupe key is a hash of that list, so a notice goes again only when the list changes (a source
 * falls due, a test is recorded), not once per source and officer.
 */
export async function queueLeakTestsDue(now: Date): Promise<string> {
  const due: { line: string; key: string }[] = [];
  for (const s of await listSources()) {
    const leak = leakState(factsFromRow(s), now.getTime());
    if (leak.state === "ok" || leak.state === "not_required") continue;
    const date = leak.state === "none_recorded" ? "none" : new Date(leak.deadline.dueMs).toISOString().slice(0, 10);
    const what = leak.state === "overdue" ? `OVERDUE since ${date}` : leak.state === "due_soon" ? `due ${date}` : "no leak test on record";
    due.push({ line: `- ${s.nuclide} ${s.serial} (${s.location}): ${what}\n  ${appUrl(`/safety/sources/${s.id}`)}`, key: `${s.id}:${leak.state}:${date}` });
  }
  if (due.length === 0) return "no leak test due";
  const listHash = createHash("sha256").update(due.map((d) => d.key).join("|")).digest("hex").slice(0, 32);
  const overdue = due.filter((d) => d.line.includes("OVERDUE")).length;
  const text = [`Leak (wipe) tests of sealed sources that need attention (${due.length}, ${overdue} overdue):`, "", ...due.map((d) => d.line)].join("\n");
  const queued = await toOfficers("safety.source.leak_test", `Leak tests: ${due.length} due or overdue`, text, (email) => dedupeKey("leak", listHash, email));
  return `${due.length} source(s) due, ${queued} notice(s) queued`;
}

/** The safety jobs, in the order they run (before the outbox job sends what they queued). */
export const SAFETY_JOBS: Job[] = [
  { name: "safety-digest", run: queueDigest },
  { name: "source-overdue", run: queueOverdueCheckouts },
  { name: "leak-tests-due", run: queueLeakTestsDue },
];
