import { expect, test } from "@playwright/test";
import { signInThroughPage, uniqueEmail } from "./support/accounts";
import { linkTo, waitForMail } from "./support/mail";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });

test("a new user signs up, confirms the address from the mail, signs out and in again", async ({ page }) => {
  const email = uniqueEmail("wren");
  const password = "long gravel road at dawn";
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Wren Calloway");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("Use at least 12 characters")).toBeVisible();
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByTestId("sign-up-sent")).toContainText(email);
  await page.screenshot(shot("sign-up-sent"));

  const mail = await waitForMail(email, /Confirm your e-mail address/);
  await page.goto(linkTo(mail, "/confirm-email"));
  await page.getByRole("button", { name: "Confirm my address" }).click();
  await expect(page.getByText("Address confirmed")).toBeVisible();
  await page.getByRole("link", { name: "Sign in" }).click();
  await expect(page.getByLabel("E-mail")).toHaveValue(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/plans$/);
  await expect(page.getByTestId("active-organisation")).toHaveText("Wren Calloway (personal)");
  await expect(page.getByTestId("active-role")).toHaveText("Your role: owner");
  await page.screenshot(shot("plans-empty"));

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto("/organisation");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Forganisation/);
  await signInThroughPage(page, email, password);
});

test("a wrong password and an unknown address get the same generic message", async ({ page }) => {
  const messages: string[] = [];
  for (const [email, password] of [
    ["olive.marsh@tallowmere-tours.example", "not the right phrase"],
    [uniqueEmail("nobody"), "not the right phrase"],
  ]) {
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill(email!);
    await page.getByLabel("Password", { exact: true }).fill(password!);
    await page.getByRole("button", { name: "Sign in" }).click();
    const alert = page.locator("form [role=alert]").first();
    await expect(alert).toBeVisible();
    messages.push((await alert.textContent()) ?? "");
  }
  expect(messages[0]).toBe("That e-mail address and password do not match. Check both and try again.");
  expect(messages[1]).toBe(messages[0]);
  await page.screenshot(shot("sign-in-wrong-password"));
});

test("the landing page explains Fadeline and carries the caution", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("brakes");
  await expect(page.getByText("Estimates, not guarantees")).toBeVisible();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot(shot("landing-phone"));
});
