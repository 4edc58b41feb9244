/**
 * The safety area in the browser: a shift crew member writes a cryogenics entry with the logbook form; the safety
 * officer finds it in the queue and in the mail, acknowledges it with a comment; the writer's edit puts it back to
 * "Awaiting review". A source left out past its allowed time shows as overdue. The oxygen estimate reads its three
 * assumptions against the 19.5 % line.
 */
import { randomBytes } from "node:crypto";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { waitForMail } from "../support/mail";
import { signInAs } from "./sign-in";

const CREW = { email: "mara.velen@kestrin-deep.example", password: "quillon-crew-1" };
const OFFICER = { email: "oskar.lunde@kestrin-deep.example", password: "quillon-safety-1" };
const tag = () => randomBytes(4).toString("hex");

async function pageFor(browser: Browser, who: { email: string; password: string }): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signInAs(page, who.email, who.password);
  return page;
}

test.describe("safety", () => {
  test("a cryogenics entry is queued, mailed, acknowledged, and re-opened by an edit", async ({ browser }) => {
    const crew = await pageFor(browser, CREW);
    const title = `LN2 transfer line frosted at the cryostat ${tag()}`;
    await crew.goto("/logbook/new");
    await crew.getByLabel("Category").selectOption("cryogenics");
    await crew.getByLabel("Title").fill(title);
    await crew.getByRole("button", { name: "Save entry" }).click();
    await crew.waitForURL(/\/logbook\/\d+/);
    const entryId = Number(/\/logbook\/(\d+)/.exec(crew.url())?.[1]);
    expect(entryId).toBeGreaterThan(0);

    const officer = await pageFor(browser, OFFICER);
    await officer.goto("/safety");
    const row = officer.getByTestId(`review-row-${entryId}`);
    await expect(row).toContainText("Awaiting review");
    await expect(row.getByRole("link", { name: title, exact: true })).toHaveAttribute("href", `/logbook/${entryId}`);
    await expect(officer.getByRole("note")).toContainText("Caution");

    const mail = await waitForMail(OFFICER.email, new RegExp(`Safety review needed: ${title}`));
    expect(mail.text).toContain(`/logbook/${entryId}`);

    await row.getByRole("link", { name: `Review ${title}` }).click();
    await officer.getByLabel(/Comment/).fill("Read with the shift; the hall oxygen monitor stayed at 20.8 %.");
    await officer.getByRole("button", { name: "Acknowledge" }).click();
    await expect(officer.getByTestId("review-state")).toContainText("Acknowledged");

    const edit = await crew.request.put(`/api/entries/${entryId}`, {
      data: { baseRevision: 1, title, body: "Frost cleared after the transfer; no venting into the hall.", tags: [], runNumbers: [] },
    });
    expect(edit.status()).toBe(200);

    await officer.reload();
    await expect(officer.getByTestId("review-state")).toContainText("Awaiting review");
    await expect(officer.getByRole("list", { name: "Review trail" })).toContainText("re-opened by revision 2");
  });

  test("a source checked out past its allowed time shows as overdue", async ({ browser }) => {
    const officer = await pageFor(browser, OFFICER);
    const serial = `E2E-CS-${tag()}`;
    const created = await officer.request.post("/api/sources", {
      data: { nuclide: "Cs-137", serial, referenceActivityBq: 370000, referenceDate: "2024-06-01", location: "Test bench", allowedOutHours: 0.05 },
    });
    expect(created.status()).toBe(201);
    const { id } = (await created.json()) as { id: number };
    const out = await officer.request.post(`/api/sources/${id}/checkouts`, {
      data: { purpose: "Left at the cryostat after a calibration", checkedOutAt: new Date(Date.now() - 2 * 3_600_000).toISOString() },
    });
    expect(out.status()).toBe(201);

    await officer.goto("/safety/sources");
    await expect(officer.getByTestId(`source-row-${serial}`)).toContainText("Overdue");
    await officer.getByRole("link", { name: `Cs-137 · ${serial}` }).click();
    await expect(officer.getByTestId("checkout-state")).toContainText("Overdue");
    await expect(officer.getByTestId("activity-today")).toContainText("kBq");
  });

  test("the oxygen estimate shows each assumption against the 19.5 % line", async ({ browser }) => {
    const crew = await pageFor(browser, CREW);
    await crew.goto("/safety/oxygen");
    await expect(crew.getByRole("note")).toContainText("Caution");
    await crew.getByLabel("Liquid released (L)").fill("20");
    await crew.getByLabel("Cryogen").selectOption("nitrogen");
    await crew.getByLabel("Length × width × height").check();
    await crew.getByLabel("Length", { exact: true }).fill("6");
    await crew.getByLabel("Width", { exact: true }).fill("4");
    await crew.getByLabel("Height", { exact: true }).fill("3");
    await crew.getByRole("button", { name: "Estimate oxygen" }).click();
    // 20 L LN2 × 694 (expansion ratio, common practice) = 13.88 m³ of gas in a 72 m³ room:
    // displacement 20.9 % × (1 − 13.88/72) = 16.9 %, mixing 20.9 % × e^(−13.88/72) = 17.2 %, sealed 20.9 % × 72/85.88 = 17.5 %.
    await expect(crew.getByTestId("oxygen-displacement")).toContainText("16.9 %");
    await expect(crew.getByTestId("oxygen-mixing")).toContainText("17.2 %");
    await expect(crew.getByTestId("oxygen-sealed")).toContainText("17.5 %");
    await expect(crew.getByTestId("oxygen-sealed")).toContainText("Below the 19.5 % line");
    await expect(crew.getByTestId("oxygen-result")).toContainText("694");
    await expect(crew.getByTestId("oxygen-result")).toContainText("does not replace");

    await crew.getByLabel("Liquid released (L)").fill("0.5");
    await crew.getByRole("button", { name: "Estimate oxygen" }).click();
    // 0.347 m³ in 72 m³: every model stays near 20.8 %, above the line.
    await expect(crew.getByTestId("oxygen-mixing")).toContainText("Above the 19.5 % line");
  });
});
