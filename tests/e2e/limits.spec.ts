/**
 * The limits page in the browser: a convener records n and b for a period whose exposure is known exactly
 * (its own configuration and run, in 2033, away from the demo data), reads the rate limit with its method and
 * CL, switches to Feldman–Cousins and sees the number the library gives; a blind period shows no count or limit.
 */
import { expect, test } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { eq, inArray } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { detectorConfigs, dqPeriods, runs } from "@/db/schema";
import { DEMO_PEOPLE } from "@/db/seed/people";
import { computeLimit, rateUpper } from "@/lib/limits";
import { RATE_UNIT, limitTag, rateText } from "@/lib/limits-view";
import { signInAs } from "./sign-in";

const DAY = 86_400_000;
const T0 = Date.UTC(2033, 0, 1) + Math.floor(Math.random() * 300) * DAY;
const tag = randomUUID().slice(0, 8);
const OPEN_NAME = `E2E limits ${tag}`;
const BLIND_NAME = `E2E limits blind ${tag}`;
const SECRET_COUNT = 73_129;
// One run of one day with 43 200 s live on a 100 kg target: 0.5 d × 100 kg = 50 kg·day (hand arithmetic).
const EXPOSURE_KG_DAY = 50;
const ACCEPTANCE = 0.5;

const ids = { config: 0, run: 0, open: 0, blind: 0 };
const priya = DEMO_PEOPLE.find((p) => p.email === "priya.castel@kestrin-deep.example")!;

test.beforeAll(async () => {
  const [cfg] = await db.insert(detectorConfigs).values({
    detector: "Quillon-Ge", name: `limits e2e bench ${tag}`, targetMaterial: "germanium", fiducialMassKg: "100.0000", effectiveFrom: new Date(T0 - DAY),
  });
  ids.config = cfg.insertId;
  const [run] = await db.insert(runs).values({
    number: 6_000_000 + Math.floor(Math.random() * 999_000), type: "science", status: "ended", startAt: new Date(T0 + 3_600_000),
    endAt: new Date(T0 + 3_600_000 + DAY), liveSeconds: "43200.000", deadSeconds: "0.000", triggerCount: 1, configId: ids.config, conditions: {},
  });
  ids.run = run.insertId;
  const span = { startAt: new Date(T0), endAt: new Date(T0 + 2 * DAY), runTypes: ["science" as const], signalAcceptance: ACCEPTANCE };
  const [open] = await db.insert(dqPeriods).values({ name: OPEN_NAME, ...span, blind: false });
  ids.open = open.insertId;
  // A stored count on a blind period (as if recorded before it was made blind) must still never be shown.
  const [blind] = await db.insert(dqPeriods).values({ name: BLIND_NAME, ...span, blind: true, observedCount: SECRET_COUNT, expectedBackground: 0.4, backgroundNote: "e2e model" });
  ids.blind = blind.insertId;
});

test.afterAll(async () => {
  await db.delete(dqPeriods).where(inArray(dqPeriods.id, [ids.open, ids.blind]));
  await db.delete(runs).where(eq(runs.id, ids.run));
  await db.delete(detectorConfigs).where(eq(detectorConfigs.id, ids.config));
  await closeDb();
});

/** The rate text the page should print for (n, b) with a method at 90 %, from lib/limits and the known exposure. */
function expectedRate(method: "classical" | "fc", n: number, b: number) {
  const mu = computeLimit(method, n, b, 0.9).upper!;
  const perKgDay = rateUpper(mu, ACCEPTANCE, EXPOSURE_KG_DAY).perKgDay;
  return { perKgDay, text: rateText(0, perKgDay, RATE_UNIT.perKgDay), tag: limitTag(method, 0.9) };
}

test("a convener records n and b, reads the rate with method and CL, and switches to Feldman–Cousins", async ({ page }) => {
  await signInAs(page, priya.email, priya.password);
  await page.goto("/limits");
  const row = page.getByTestId(`limit-row-${ids.open}`);
  await expect(row).toContainText("No count or background recorded yet");
  await expect(row.getByTestId("exposure")).toHaveAttribute("data-value", String(EXPOSURE_KG_DAY));

  const settings = page.getByRole("group", { name: "Limit settings" });
  await settings.getByLabel("Method").selectOption("classical");

  const form = page.getByRole("form", { name: "Record count and background" });
  await form.getByLabel("Period").selectOption({ label: OPEN_NAME });
  await form.getByLabel("Observed count n (events)").fill("0");
  await form.getByLabel("Expected background b (events)").fill("0");
  await form.getByLabel("Where the background comes from").fill("e2e bench: no background expected (invented)");
  await form.getByRole("button", { name: "Record" }).click();
  await expect(form.getByRole("status")).toContainText(`Recorded for ${OPEN_NAME}`);

  // Classical 90 %, n = 0, b = 0: μ_up = −ln 0.1 = 2.3026 (analytic); / (0.5 × 50 kg·day) = 0.0921 events/(kg·day).
  const classical = expectedRate("classical", 0, 0);
  const rate = row.getByTestId("rate-kgday");
  await expect(rate).toContainText(`${classical.text} · ${classical.tag}`);
  expect(Number(await rate.getAttribute("data-value"))).toBeCloseTo(2.302585 / 25, 6);
  await expect(row.getByTestId("observed")).toHaveText("0 events");

  await settings.getByLabel("Method").selectOption("fc");
  // FC 90 %, n = 0, b = 0: μ_up = 2.44 (FC 1998 Table IV, from memory); 2.44 / 25 = 0.0976 events/(kg·day).
  const fc = expectedRate("fc", 0, 0);
  await expect(rate).toContainText(`${fc.text} · ${fc.tag}`);
  expect(Number(await rate.getAttribute("data-value"))).toBeCloseTo(fc.perKgDay, 9);
  expect(fc.perKgDay).toBeCloseTo(2.44 / 25, 3);
  await expect(row.getByTestId("mu-interval")).toContainText("[0.00, 2.44] events · FC 90 % CL");
  await expect(page).toHaveURL(/method=fc&cl=0.9/);
});

test("a blind period shows no count and no limit, not even in the page data", async ({ page }) => {
  await signInAs(page, priya.email, priya.password);
  await page.goto("/limits");
  const row = page.getByTestId(`limit-row-${ids.blind}`);
  await expect(row.getByTestId("blind-notice")).toContainText("Blind — count hidden until unblinding");
  await expect(row.getByTestId("rate-kgday")).toHaveCount(0);
  await expect(row.getByTestId("mu-interval")).toHaveCount(0);
  await expect(row.getByTestId("observed")).toHaveCount(0);
  expect(await page.content()).not.toContain(String(SECRET_COUNT));

  const form = page.getByRole("form", { name: "Record count and background" });
  await form.getByLabel("Period").selectOption({ label: `${BLIND_NAME} (blind)` });
  await expect(form.getByLabel("Observed count n (events)")).toBeDisabled();
  await expect(form).toContainText("Blind — n can be recorded only after the unblinding is recorded.");
});
