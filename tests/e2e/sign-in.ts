/** Browser-test helper: sign in through the real sign-in form. */
import { expect, type Page } from "@playwright/test";

/** Sign in and wait until the signed-in shell is shown. */
export async function signInAs(page: Page, email: string, password: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("who")).toBeVisible();
}
