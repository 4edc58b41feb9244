/**
 * The runs area in the browser as a shift crew member: the live table with the demo runs, filtering,
 * a run page, opening and closing a run by hand, and a run the DAQ opens showing up without a reload.
 */
import { expect, test } from "@playwright/test";
import { closeDb } from "@/db/client";
import { createToken, revokeToken } from "@/db/tokens";
import { newToken } from "@/lib/auth/secrets";
import { signInAs } from "./sign-in";

const CREW = { email: "mara.velen@kestrin-deep.example", password: "quillon-crew-1" };
const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";
const uniqueNumber = () => 19_000_000 + Math.floor(Math.random() * 1_000_000);
const utcInput = (ms: number) => new Date(ms).toISOString().slice(0, 19);

test.afterAll(closeDb);

test.describe("runs", () => {
  test.beforeEach(async ({ page }) => {
    await signInAs(page, CREW.email, CREW.password);
  });

  test("the table shows the demo runs, filters by type, and a run page shows its live fraction", async ({ page }) => {
    await page.goto("/runs");
    const rows = page.getByTestId("run-row");
    await expect(rows.first()).toBeVisible();
    expect(await rows.count()).toBeGreaterThan(10);
    await expect(page.getByRole("link", { name: /^41\d{3}$/ }).first()).toBeVisible(); // demo numbers start at 41000

    await page.getByRole("search", { name: "Filter runs" }).getByLabel("Type").selectOption("calibration");
    await expect.poll(async () => {
      const types = await rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute("data-run-type")));
      return types.length > 0 && types.every((t) => t === "calibration");
    }, { timeout: 15_000 }).toBe(true);

    // The first calibration run that has ended (it has a live fraction).
    const ended = rows.filter({ hasText: "ended" }).first();
    const number = (await ended.getByRole("link").first().textContent())?.trim() ?? "";
    await ended.getByRole("link").first().click();
    await expect(page.getByRole("heading", { level: 1 })).toContainText(`Run ${number}`);
    await expect(page.getByTestId("live-fraction")).toContainText(/\d{1,3}\.\d %/);
    await expect(page.getByRole("meter", { name: "Live fraction" })).toBeVisible();
    await expect(page.getByRole("link", { name: /Add a note/ })).toHaveAttribute("href", `/logbook/new?category=run_note&run=${number}`);
  });

  test("a shift crew member opens a run from the form and closes it", async ({ page }) => {
    const number = uniqueNumber();
    const start = Date.now() - 10 * 60_000;
    await page.goto("/runs");
    await page.getByText("Open a run", { exact: true }).click();
    const form = page.getByRole("form", { name: "Open a run" });
    await form.getByLabel("Run number").fill(String(number));
    await form.getByLabel("Type").selectOption("commissioning");
    await form.getByLabel("Start (UTC)").fill(utcInput(start));
    await form.getByLabel(/^Conditions/).fill("purpose = browser test\ndrift field [kV/cm] = 0.23");
    await form.getByRole("button", { name: "Open run" }).click();

    await expect(page).toHaveURL(new RegExp(`/runs/${number}$`));
    await expect(page.getByRole("heading", { level: 1 })).toContainText("running");
    await expect(page.getByRole("table", { name: "Conditions" })).toContainText("browser test");

    await page.getByLabel("Live time (s)").fill("560.5");
    await page.getByLabel("Dead time (s)").fill("30");
    await page.getByLabel("Trigger count").fill("8400");
    await page.getByRole("button", { name: "Close run" }).click();
    await expect(page.getByRole("heading", { level: 1 })).toContainText("ended");
    await expect(page.getByTestId("live-fraction")).toContainText("%");
  });

  test("the form refuses live + dead time beyond the duration and names the field", async ({ page }) => {
    const number = uniqueNumber();
    await page.goto("/runs");
    await page.getByText("Open a run", { exact: true }).click();
    await page.getByLabel("Run number").fill(String(number));
    await page.getByLabel("Start (UTC)").fill(utcInput(Date.now() - 100_000));
    await page.getByRole("button", { name: "Open run" }).click();
    await expect(page).toHaveURL(new RegExp(`/runs/${number}$`));
    await page.getByLabel("Live time (s)").fill("90");
    await page.getByLabel("Dead time (s)").fill("50");
    await page.getByLabel("Trigger count").fill("10");
    await page.getByRole("button", { name: "Close run" }).click();
    await expect(page.getByText(/exceeds the run duration .* by more than the tolerance/)).toBeVisible();
    await expect(page.getByLabel("Dead time (s)")).toHaveAttribute("aria-invalid", "true");
    // Close it properly so no test run stays open.
    await page.getByLabel("Dead time (s)").fill("5");
    await page.getByRole("button", { name: "Close run" }).click();
    await expect(page.getByRole("heading", { level: 1 })).toContainText("ended");
  });

  test("a run the DAQ opens with a token appears in the table without a reload", async ({ page }) => {
    const { token, hash } = newToken("dsk_");
    const tokenId = await createToken({}, `e2e-daq-${Date.now()}`, ["daq"], hash);
    const number = uniqueNumber();
    const start = Date.now();
    await page.goto("/runs");
    await expect(page.getByTestId("run-row").first()).toBeVisible();
    await expect(page.getByRole("link", { name: String(number), exact: true })).toHaveCount(0);

    const daq = (path: string, method: string, body: unknown) =>
      fetch(`${APP_URL}${path}`, { method, headers: { "content-type": "application/json", authorization: `Bearer ${token}` }, body: JSON.stringify(body) });
    expect((await daq("/api/runs", "POST", { number, type: "science", start: new Date(start).toISOString() })).status).toBe(201);
    try {
      await expect(page.getByRole("link", { name: String(number), exact: true })).toBeVisible({ timeout: 40_000 });
      await expect(page.getByTestId("live-indicator")).toBeVisible();
    } finally {
      await daq(`/api/runs/${number}`, "PATCH", { end: new Date(Math.max(Date.now(), start + 2000)).toISOString(), liveSeconds: 1, deadSeconds: 0, triggerCount: 3 });
      await revokeToken({}, tokenId);
    }
  });
});
