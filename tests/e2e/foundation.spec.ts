import { expect, test } from "@playwright/test";
import { DEMO_PEOPLE } from "@/db/seed/people";
import { signInAs } from "./sign-in";

const MAIL_FAKE_URL = process.env.MAIL_FAKE_URL ?? "http://127.0.0.1:2590";
const person = (email: string) => DEMO_PEOPLE.find((p) => p.email === email)!;

// What each role's navigation should show, from the permission table's design (PRODUCT.md roles).
const NAVIGATION: { email: string; sees: string[]; hidden: string[] }[] = [
  { email: "mara.velen@kestrin-deep.example", sees: ["Runs", "Logbook", "Data quality", "Exposure", "Limits", "Safety"], hidden: ["Admin"] },
  { email: "tobias.renn@kestrin-deep.example", sees: ["Runs", "Logbook", "Data quality", "Safety"], hidden: ["Admin"] },
  { email: "priya.castel@kestrin-deep.example", sees: ["Exposure", "Limits"], hidden: ["Admin"] },
  { email: "oskar.lunde@kestrin-deep.example", sees: ["Logbook", "Safety"], hidden: ["Admin"] },
  { email: "hedda.marsh@kestrin-deep.example", sees: ["Runs", "Admin"], hidden: [] },
  { email: "jonah.fell@kestrin-deep.example", sees: ["Runs", "Logbook", "Data quality", "Safety"], hidden: ["Admin"] },
];

test.describe("sign-in and navigation by role", () => {
  for (const row of NAVIGATION) {
    test(`${person(row.email).displayName} (${person(row.email).roles.join(", ")}) sees their areas`, async ({ page }) => {
      await signInAs(page, row.email, person(row.email).password);
      const nav = page.getByRole("navigation", { name: "Areas" });
      for (const label of row.sees) await expect(nav.getByRole("link", { name: label })).toBeVisible();
      for (const label of row.hidden) await expect(nav.getByRole("link", { name: label })).toHaveCount(0);
      await expect(page.getByTestId("utc-clock")).toContainText("UTC");
    });
  }

  test("a signed-out visitor is sent to the sign-in page", async ({ page }) => {
    await page.goto("/admin");
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fadmin/);
  });
});

test("shift crew gets 403 from an admin route and the not-allowed page on an admin page", async ({ page }) => {
  const crew = person("mara.velen@kestrin-deep.example");
  await signInAs(page, crew.email, crew.password);
  const res = await page.request.get("/api/admin/users");
  expect(res.status()).toBe(403);
  await page.goto("/admin");
  await expect(page.getByRole("heading", { name: "Not allowed" })).toBeVisible();
  await expect(page.getByText("manage people and roles")).toBeVisible();
});

test("an admin invites a person; the mail arrives; the link sets a password; the person signs in", async ({ page, browser }) => {
  const admin = person("hedda.marsh@kestrin-deep.example");
  const email = `new-crew-${Date.now()}@kestrin-deep.example`;
  await signInAs(page, admin.email, admin.password);
  await page.goto("/admin");
  const form = page.getByRole("form", { name: "Invite a person" });
  await form.getByLabel("Name").fill("Rhea Invited");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("shift crew").check();
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByRole("status")).toContainText(`Invitation sent to ${email}`);

  let link = "";
  await expect
    .poll(async () => {
      const messages = (await (await page.request.get(`${MAIL_FAKE_URL}/messages`)).json()) as { to: string; text: string }[];
      const mail = messages.find((m) => m.to.includes(email));
      link = mail?.text.match(/https?:\/\/\S+\/set-password\?token=\S+/)?.[0] ?? "";
      return link;
    })
    .not.toBe("");

  const fresh = await browser.newContext();
  const newcomer = await fresh.newPage();
  await newcomer.goto(link);
  await expect(newcomer.getByText("For Rhea Invited")).toBeVisible();
  await newcomer.getByLabel("New password").fill("kestrin-fresh-pw-1");
  await newcomer.getByLabel("The same again").fill("kestrin-fresh-pw-1");
  await newcomer.getByRole("button", { name: "Set password" }).click();
  await expect(newcomer.getByText("Password set")).toBeVisible();
  await signInAs(newcomer, email, "kestrin-fresh-pw-1");
  await expect(newcomer.getByTestId("who")).toContainText("Rhea Invited");
  // The link works once.
  await newcomer.goto(link);
  await expect(newcomer.getByText(/expired or was already used/)).toBeVisible();
  await fresh.close();
});

test("the sixth wrong password is refused by the rate limit", async ({ page }) => {
  // A fresh invited-and-activated account is not needed: an unknown address is throttled the same way.
  const email = `nobody-${Date.now()}@kestrin-deep.example`;
  await page.goto("/sign-in");
  for (let i = 1; i <= 6; i++) {
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(`wrong-${i}`);
    await page.getByRole("button", { name: "Sign in" }).click();
    const expected = i <= 5 ? /do not match an active account/ : /Too many failed sign-ins/;
    await expect(page.getByTestId("sign-in-error")).toContainText(expected);
  }
});

test("the overview shows what is running and the latest entries", async ({ page }) => {
  const crew = person("mara.velen@kestrin-deep.example");
  await signInAs(page, crew.email, crew.password);
  await expect(page.getByRole("heading", { name: "Taking data now" })).toBeVisible();
  // The demo scenario ends with one run still open (db/seed/seed-runs.ts).
  await expect(page.getByText("running").first()).toBeVisible();
  await expect(page.getByRole("heading", { name: "Latest in the logbook" })).toBeVisible();
  await expect(page.locator('a[href^="/logbook/"]').first()).toBeVisible();
  // Safety counts are for the people who work the queue.
  await expect(page.getByRole("heading", { name: "Safety review queue" })).toHaveCount(0);
});
