/**
 * The logbook in the browser as a shift crew member: write an entry with bold text and a picture (progress shown),
 * see it rendered with its thumbnail, revise it and read the history; a hostile body renders inert; a draft survives
 * a reload; an edit that crosses someone else's save keeps the writer's text.
 */
import { expect, test, type Page } from "@playwright/test";
import { tinyPng } from "@/lib/logbook/tiny-png";
import { signInAs } from "./sign-in";

const CREW = { email: "mara.velen@kestrin-deep.example", password: "quillon-crew-1" };
const unique = () => Math.random().toString(36).slice(2, 8);

async function entryIdFrom(page: Page): Promise<number> {
  await page.waitForURL(/\/logbook\/\d+$/, { timeout: 30_000 });
  return Number(new URL(page.url()).pathname.split("/").pop());
}

test.describe("logbook", () => {
  test.beforeEach(async ({ page }) => {
    await signInAs(page, CREW.email, CREW.password);
  });

  test("writes an entry with bold text and a PNG, sees it rendered, edits it and reads two revisions", async ({ page }) => {
    const title = `PMT gain check ${unique()}`;
    await page.goto("/logbook/new");
    await page.getByLabel("Category").selectOption("detector");
    await page.getByLabel("Title").fill(title);
    const editor = page.locator("[contenteditable=true]").first();
    await editor.click();
    await page.keyboard.type("Gain of ");
    await page.keyboard.press("Control+b");
    await page.keyboard.type("PMT fourteen");
    await page.keyboard.press("Control+b");
    await page.keyboard.type(" is back at reference.");
    await page.getByLabel("Tags").fill("pmt, gain");
    await page.getByLabel("Linked runs").fill("41010");

    const png = Buffer.from(tinyPng(24, 12, (x, y) => [x * 10, 80 + y * 10, 200]));
    await page.getByLabel("Attach files").setInputFiles({ name: "gain-map.png", mimeType: "image/png", buffer: png });
    await expect(page.getByRole("progressbar", { name: "Upload of gain-map.png" })).toBeVisible();

    await page.getByRole("button", { name: "Save entry" }).click();
    const id = await entryIdFrom(page);
    await page.reload();
    const body = page.getByTestId("entry-body");
    await expect(body.locator("strong")).toHaveText("PMT fourteen");
    const thumb = page.getByTestId("thumbnail");
    await expect(thumb).toHaveAttribute("alt", "gain-map.png");
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15_000 }).toBe(24);

    await page.getByRole("link", { name: /^✎ Edit/ }).click();
    await expect(page).toHaveURL(new RegExp(`/logbook/${id}/edit$`));
    await page.getByLabel("Title").fill(`${title} (rechecked)`);
    const editEditor = page.locator("[contenteditable=true]").first();
    await editEditor.click();
    await page.keyboard.press("Control+End");
    await page.keyboard.press("Enter");
    await page.keyboard.type("Rechecked after the LED run.");
    // On the edit page a picture uploads at once and can be placed in the text.
    const second = Buffer.from(tinyPng(10, 10, (x) => [250, x * 25, 0]));
    await page.getByLabel("Attach files").setInputFiles({ name: "led-run.png", mimeType: "image/png", buffer: second });
    await expect(page.getByRole("progressbar", { name: "Upload of led-run.png" })).toHaveAttribute("aria-valuetext", "100 % stored");
    await page.getByRole("button", { name: "Insert into text" }).click();
    await expect(editEditor.locator('img[src^="/api/attachments/"]')).toHaveCount(1);
    await page.getByRole("button", { name: "Save entry" }).click();
    await page.waitForURL(new RegExp(`/logbook/${id}$`));
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(`${title} (rechecked)`);
    await expect(page.getByTestId("revision")).toHaveCount(2);
    const newest = page.getByTestId("revision").first();
    await expect(newest).toContainText("Revision 2");
    await expect(newest.getByRole("list", { name: "Text changes" })).toContainText("Rechecked after the LED run.");
    await expect(newest).toContainText(/\+ \d+ lines? added, − 0 lines removed/); // marked with signs, not colour alone
    const inline = body.locator('img[src^="/api/attachments/"]');
    await expect.poll(() => inline.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15_000 }).toBe(10);
    await expect(page.getByTestId("thumbnail")).toHaveCount(2);
  });

  test("a failed upload leaves the entry saved, says which file failed and why, and its retry works", async ({ page }) => {
    let aborted = false;
    await page.route("**/api/entries/*/attachments*", async (route) => {
      if (!aborted && route.request().headers()["x-file-name"] === "o2-trend.png") {
        aborted = true; // the first try of this file dies on the wire, as with a dropped connection
        return route.abort("connectionreset");
      }
      return route.continue();
    });
    await page.goto("/logbook/new?category=cryogenics");
    await expect(page.getByRole("note").filter({ hasText: "Caution" })).toBeVisible();
    await page.getByLabel("Title").fill(`O2 monitor trend ${unique()}`);
    await page.getByLabel("Attach files").setInputFiles([
      { name: "o2-trend.png", mimeType: "image/png", buffer: Buffer.from(tinyPng(8, 8, () => [20, 160, 90])) },
      { name: "not-a-picture.png", mimeType: "image/png", buffer: Buffer.from("plain words, not a PNG\n") },
    ]);
    await page.getByRole("button", { name: "Save entry" }).click();
    await expect(page.getByRole("status").filter({ hasText: "The entry is saved (revision 1)" })).toBeVisible();
    await expect(page.getByRole("alert").filter({ hasText: "not-a-picture.png did not upload" })).toContainText("PNG signature");
    await expect(page.getByRole("alert").filter({ hasText: "o2-trend.png did not upload" })).toContainText("connection broke off");
    await page.getByRole("button", { name: "↻ Retry o2-trend.png" }).click();
    await expect(page.getByRole("progressbar", { name: "Upload of o2-trend.png" })).toHaveAttribute("aria-valuetext", "100 % stored");
    await page.getByRole("link", { name: "Open the entry" }).click();
    await expect(page.getByTestId("thumbnail")).toHaveCount(1);
    await expect(page.getByRole("list", { name: "Uploads not stored" })).toContainText("not-a-picture.png");
  });

  test("raw HTML and javascript: links in a body render inert", async ({ page }) => {
    const dialogs: string[] = [];
    page.on("dialog", (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    const res = await page.request.post("/api/entries", {
      data: {
        category: "run_note",
        title: `Hostile body ${unique()}`,
        body: "Before <img src=x onerror=alert(1)> after.\n\n[x](javascript:alert(1)) and <script>alert(2)</script>\n",
        tags: [],
        runNumbers: [],
        needsSafetyReview: false,
      },
    });
    expect(res.status()).toBe(201);
    const { id } = (await res.json()) as { id: number };
    await page.goto(`/logbook/${id}`);
    const body = page.getByTestId("entry-body");
    await expect(body).toContainText("Before");
    await expect(page.locator('img[src="x"]')).toHaveCount(0);
    await expect(page.locator('a[href^="javascript:" i]')).toHaveCount(0);
    await expect(body.getByText("x", { exact: true })).toBeVisible(); // the link text stays, without a target
    await page.waitForTimeout(500);
    expect(dialogs).toEqual([]);
  });

  test("a draft survives a reload and can be discarded", async ({ page }) => {
    const title = `Unsaved note ${unique()}`;
    await page.goto("/logbook/new?category=run_note&run=41020");
    await expect(page.getByLabel("Category")).toHaveValue("run_note");
    await expect(page.getByLabel("Linked runs")).toHaveValue("41020");
    await page.getByLabel("Title").fill(title);
    await page.locator("[contenteditable=true]").first().click();
    await page.keyboard.type("Trigger rate rose to 5 Hz");
    await page.waitForTimeout(1200); // the draft is written after a short pause in typing
    await page.reload();
    await expect(page.getByRole("status").filter({ hasText: "Restored your unsaved draft" })).toBeVisible();
    await expect(page.getByLabel("Title")).toHaveValue(title);
    await expect(page.locator("[contenteditable=true]").first()).toContainText("Trigger rate rose to 5 Hz");
    await page.getByRole("button", { name: "Discard draft" }).click();
    await expect(page.getByLabel("Title")).toHaveValue("Run 41020: ");
    await page.reload();
    await expect(page.getByText("Restored your unsaved draft")).toHaveCount(0);
  });

  test("an edit that crosses a newer save is refused but keeps the writer's text", async ({ page }) => {
    const res = await page.request.post("/api/entries", {
      data: { category: "maintenance", title: `Dewar refill ${unique()}`, body: "Dewar D-2 at 60 %.", tags: [], runNumbers: [], needsSafetyReview: false },
    });
    const { id } = (await res.json()) as { id: number };
    await page.goto(`/logbook/${id}/edit`);
    await page.getByLabel("Title").fill("My version of the refill note");
    // Meanwhile someone else saves revision 2.
    const other = await page.request.put(`/api/entries/${id}`, { data: { baseRevision: 1, title: "Their version", body: "Dewar D-2 at 93 %.", tags: [], runNumbers: [] } });
    expect(other.status()).toBe(200);
    await page.getByRole("button", { name: "Save entry" }).click();
    const alert = page.getByRole("alert").filter({ hasText: "this entry changed while you were editing" });
    await expect(alert).toBeVisible();
    await expect(alert.getByRole("link", { name: "View revision 2 ↗" })).toHaveAttribute("href", `/logbook/${id}#revision-2`);
    await expect(page.getByLabel("Title")).toHaveValue("My version of the refill note");
    await alert.getByRole("button", { name: "Save mine as revision 3" }).click();
    await page.waitForURL(new RegExp(`/logbook/${id}$`));
    await expect(page.getByTestId("revision")).toHaveCount(3);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("My version of the refill note");
  });
});
