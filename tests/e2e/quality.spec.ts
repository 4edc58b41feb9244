import { expect, test, type Browser, type Page } from "@playwright/test";
import { randomInt, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { closeDb, db } from "../../db/client";
import { badTimeFlags, detectorConfigs, dqPeriods, runs, subsystems } from "../../db/schema";

// Two-person rule end to end: expert Tobias proposes a flag on a run (picked on its timeline), expert Ilse confirms
// it, convener Priya sees the period's exposure drop. Own run, period and subsystem on a day far from the demo data.
// By hand: a 10 h run with 9 h live on 950 kg gives 32 400 / 86 400 × 950 = 356.25 kg·day; a confirmed 1 h
// excluding flag removes 950 × 0.9 h / 24 = 35.625 kg·day, leaving 320.625 kg·day.
const BEFORE = 356.25;
const DROP = 35.625;
const H = 3_600_000;
const DAY0 = Date.UTC(2033, 0, 1) + randomInt(0, 2500) * 86_400_000;
const RUN_START = DAY0 + 6 * H;
const RUN_NUMBER = 80_000_000 + randomInt(0, 9_000_000);
const tag = randomUUID().slice(0, 8);
const SUBSYSTEM = `e2e-${tag}`;
const utc = (ms: number) => new Date(ms).toISOString().slice(0, 19).replace("T", " ");

let configId = 0;
let periodId = 0;

test.beforeAll(async () => {
  await db.insert(subsystems).values({ code: SUBSYSTEM, label: `DAQ crate ${tag}`, active: true });
  const [cfg] = await db.insert(detectorConfigs).values({
    detector: `Quillon-e2e-${tag}`, name: `e2e ${tag}`, targetMaterial: "xenon", fiducialMassKg: "950", effectiveFrom: new Date(DAY0),
  });
  configId = cfg.insertId;
  await db.insert(runs).values({
    number: RUN_NUMBER, type: "science", status: "ended", startAt: new Date(RUN_START), endAt: new Date(RUN_START + 10 * H),
    liveSeconds: "32400.000", deadSeconds: "3600.000", configId, conditions: {},
  });
  const [p] = await db.insert(dqPeriods).values({
    name: `e2e period ${tag}`, startAt: new Date(DAY0), endAt: new Date(DAY0 + 24 * H), runTypes: ["science"], signalAcceptance: 0.8, blind: false,
  });
  periodId = p.insertId;
});

test.afterAll(async () => {
  await db.delete(badTimeFlags).where(eq(badTimeFlags.subsystem, SUBSYSTEM));
  await db.delete(subsystems).where(eq(subsystems.code, SUBSYSTEM));
  await db.delete(runs).where(eq(runs.number, RUN_NUMBER));
  await db.delete(dqPeriods).where(eq(dqPeriods.id, periodId));
  await db.delete(detectorConfigs).where(eq(detectorConfigs.id, configId));
  await closeDb();
});

async function signedIn(browser: Browser, email: string, password: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: /sign in/i }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
  return page;
}

async function pageExposure(page: Page): Promise<number> {
  await page.goto(`/exposure/${periodId}`);
  return Number(await page.getByTestId("total-exposure-kgday").getAttribute("data-value"));
}

test("an expert proposes, another confirms, the convener's exposure drops by 35.625 kg·day", async ({ browser }) => {
  const priya = await signedIn(browser, "priya.castel@kestrin-deep.example", "quillon-convener");
  expect(await pageExposure(priya)).toBeCloseTo(BEFORE, 9);

  // Tobias picks the interval on the run's timeline, then types it exactly.
  const tobias = await signedIn(browser, "tobias.renn@kestrin-deep.example", "quillon-expert-1");
  await tobias.goto("/quality");
  await tobias.getByLabel("Run number (to pick on its timeline)").fill(String(RUN_NUMBER));
  await tobias.getByRole("button", { name: "Show run timeline" }).click();
  const bar = tobias.getByTestId("run-timeline");
  await expect(bar).toBeVisible();
  const box = (await bar.boundingBox())!;
  await tobias.mouse.move(box.x + box.width * 0.4, box.y + box.height / 2);
  await tobias.mouse.down();
  await tobias.mouse.move(box.x + box.width * 0.45, box.y + box.height / 2, { steps: 4 });
  await tobias.mouse.move(box.x + box.width * 0.5, box.y + box.height / 2, { steps: 4 });
  await tobias.mouse.up();
  await expect(tobias.getByTestId("timeline-selection")).toBeVisible();
  const form = tobias.getByRole("form", { name: "Propose a bad-time flag" });
  const picked = Date.parse(`${(await form.getByLabel("Start (UTC)").inputValue()).replace(" ", "T")}Z`);
  // The drag started 40 % into the 10 h run: about 4 h after its start (pixel rounding allows a few minutes).
  expect(Math.abs(picked - (RUN_START + 4 * H))).toBeLessThan(10 * 60_000);
  await expect(form.getByLabel("End (UTC)")).not.toHaveValue("");

  await form.getByLabel("Start (UTC)").fill(utc(RUN_START + 4 * H));
  await form.getByLabel("End (UTC)").fill(utc(RUN_START + 5 * H));
  await form.getByLabel("Subsystem").selectOption(SUBSYSTEM);
  await form.getByLabel("✕ exclude from exposure").check();
  await form.getByLabel("Reason").fill("Event builder busy for an hour (browser test)");
  await form.getByRole("button", { name: "Propose flag" }).click();
  const status = form.getByRole("status");
  await expect(status).toContainText("proposed");
  const flagId = Number(/Flag (\d+) proposed/.exec((await status.textContent()) ?? "")?.[1]);
  expect(flagId).toBeGreaterThan(0);

  // The proposer is not offered a confirm button, and the server refuses him anyway.
  const ownRow = tobias.getByRole("table", { name: "Flags awaiting confirmation" }).getByTestId(`flag-row-${flagId}`);
  await tobias.reload();
  await expect(ownRow).toContainText("Your proposal: another expert confirms it");
  await expect(ownRow.getByRole("button", { name: `Confirm flag ${flagId}` })).toHaveCount(0);
  const refused = await tobias.request.post(`/api/flags/${flagId}/confirm`, { data: {} });
  expect(refused.status()).toBe(403);
  expect((await refused.json()).error).toMatch(/another detector expert must confirm/);

  // Still proposed: the convener sees the preview, not yet a drop.
  expect(await pageExposure(priya)).toBeCloseTo(BEFORE, 9);
  expect(Number(await priya.getByTestId("preview").getAttribute("data-change"))).toBeCloseTo(-DROP, 9);

  // Ilse confirms it.
  const ilse = await signedIn(browser, "ilse.achter@kestrin-deep.example", "quillon-expert-2");
  await ilse.goto("/quality");
  const row = ilse.getByRole("table", { name: "Flags awaiting confirmation" }).getByTestId(`flag-row-${flagId}`);
  await row.getByRole("button", { name: `Confirm flag ${flagId}` }).click();
  // Once confirmed it leaves the waiting list and shows as confirmed, with both names, in the list of flags.
  await expect(row).toHaveCount(0);
  const listed = ilse.getByRole("table", { name: "Flags", exact: true }).getByTestId(`flag-row-${flagId}`);
  await expect(listed).toContainText("confirmed");
  await expect(listed).toContainText("Tobias Renn / Ilse Achter");

  // Priya's exposure has dropped by exactly the flag's share of the run.
  const after = await pageExposure(priya);
  expect(after).toBeCloseTo(BEFORE - DROP, 9);
  await expect(priya.getByTestId("total-exposure-kgday")).toContainText("320.625 kg·day");
  await expect(priya.getByTestId(`exposure-run-${RUN_NUMBER}`)).toContainText("1.00 h excluded");

  // The CSV export's totals line carries the same exposure as the page.
  const csv = await priya.request.get(`/api/periods/${periodId}/exposure?format=csv`);
  expect(csv.status()).toBe(200);
  expect(csv.headers()["content-disposition"]).toContain(`exposure-e2e-period-${tag}-${periodId}.csv`);
  const lines = (await csv.text()).trim().split("\r\n");
  const header = lines[0]!.split(",");
  const total = lines.find((l) => l.startsWith("total,"))!.split(",");
  expect(Number(total[header.indexOf("exposure_kg_day")])).toBe(after);
  expect(Number(total[header.indexOf("runs_counted")])).toBe(Number(await priya.getByTestId("total-runs").getAttribute("data-value")));
  expect(Number(total[header.indexOf("good_live_s")])).toBe(Number(await priya.getByTestId("total-good-live").getAttribute("data-value")));
});
