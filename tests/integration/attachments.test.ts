/**
 * Attachments against the running app, its database and the S3 fake: a PNG makes the full round trip (upload, presigned
 * redirect, identical bytes back), a file whose name says PNG but whose bytes do not is refused with the reason, a failed
 * upload can be retried, and nothing is served to someone who is not signed in.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { attachments } from "@/db/schema";
import { tinyPng } from "@/lib/logbook/tiny-png";
import { APP_URL, signIn, type Session } from "../support/http";
import { makePerson } from "../support/people";

let crew: Session;
let entryId: number;

function upload(name: string, bytes: Uint8Array<ArrayBuffer>, query = "") {
  return crew.fetch(`/api/entries/${entryId}/attachments${query}`, {
    method: "POST",
    headers: { "x-file-name": encodeURIComponent(name), "content-type": "application/octet-stream" },
    body: bytes,
  });
}

beforeAll(async () => {
  const p = await makePerson(["shift_crew"], "crew");
  crew = await signIn(p.email, p.password);
  const res = await crew.fetch("/api/entries", {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ category: "calibration", title: "Cs-137 spectrum", body: "Peak at 662 keV.", tags: [], runNumbers: [], needsSafetyReview: false }),
  });
  entryId = ((await res.json()) as { id: number }).id;
});

afterAll(async () => {
  await closeDb();
});

describe("attachment round trip", () => {
  it("stores a PNG under a server-made key and serves the same bytes through a ~60 s presigned redirect", async () => {
    const png = tinyPng(16, 8, (x, y) => [x * 16, y * 32, 128]);
    const res = await upload("../../Cs-137 spectrum.png", png);
    expect(res.status).toBe(201);
    const stored = (await res.json()) as { id: number; fileName: string; contentType: string; sizeBytes: number; url: string };
    expect(stored.fileName).toBe("Cs-137 spectrum.png"); // path parts dropped
    expect(stored.contentType).toBe("image/png");
    expect(stored.sizeBytes).toBe(png.byteLength);

    const [row] = await db.select().from(attachments).where(eq(attachments.id, stored.id));
    expect(row?.state).toBe("stored");
    expect(row?.objectKey).toMatch(new RegExp(`^entries/${entryId}/[0-9a-f-]{36}$`)); // never from the file name

    const redirect = await crew.fetch(stored.url);
    expect(redirect.status).toBe(302);
    const location = redirect.headers.get("location") ?? "";
    expect(new URL(location).searchParams.get("X-Amz-Expires")).toBe("60");
    const download = await fetch(location);
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("image/png");
    expect(new Uint8Array(await download.arrayBuffer())).toEqual(png);
  });

  it("refuses a file named .png whose bytes are not a PNG, says why, and records the failure", async () => {
    const fake = new TextEncoder().encode("this is a shift note, not a picture\n");
    const res = await upload("plot.png", fake);
    expect(res.status).toBe(415);
    const body = (await res.json()) as { error: string; attachmentId: number; field: string };
    expect(body.error).toMatch(/named as a PNG image, but its first bytes are not the PNG signature/);
    expect(body.field).toBe("file");
    const [row] = await db.select().from(attachments).where(eq(attachments.id, body.attachmentId));
    expect(row?.state).toBe("failed");
    expect(row?.failureReason).toMatch(/PNG signature/);
    const served = await crew.fetch(`/api/attachments/${body.attachmentId}`);
    expect(served.status).toBe(409); // a failed upload is never served

    // A retry with the real file reuses the failed record.
    const png = tinyPng(2, 2, () => [0, 0, 0]);
    const retried = await upload("plot.png", png, `?retry=${body.attachmentId}`);
    expect(retried.status).toBe(201);
    expect(((await retried.json()) as { id: number }).id).toBe(body.attachmentId);
  });

  it.each([
    { label: "an SVG (scripts possible)", name: "diagram.svg", bytes: new TextEncoder().encode("<svg xmlns='http://www.w3.org/2000/svg'/>"), status: 415 },
    { label: "an empty file", name: "empty.txt", bytes: new Uint8Array(0), status: 400 },
  ])("refuses $label", async ({ name, bytes, status }) => {
    const res = await upload(name, bytes);
    expect(res.status).toBe(status);
    expect(((await res.json()) as { error: string }).error.length).toBeGreaterThan(10);
  });

  it("accepts a CSV table as text/csv", async () => {
    const res = await upload("o2-monitor.csv", new TextEncoder().encode("time_utc,o2_percent\n2025-03-04T02:00Z,20.9\n"));
    expect(res.status).toBe(201);
    expect(((await res.json()) as { contentType: string }).contentType).toBe("text/csv; charset=utf-8");
  });

  it("serves nothing to a visitor who is not signed in (401)", async () => {
    const [any] = await db.select().from(attachments).where(eq(attachments.entryId, entryId)).limit(1);
    const res = await fetch(`${APP_URL}/api/attachments/${any?.id ?? 1}`, { redirect: "manual" });
    expect(res.status).toBe(401);
  });
});
