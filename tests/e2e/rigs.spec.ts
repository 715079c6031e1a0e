import { expect, test } from "@playwright/test";
import { UTE_AND_CARAVAN } from "../../lib/thermal";
import { DEMO, signInThroughApi, signInThroughPage } from "./support/accounts";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });

test("a planner builds a rig from a preset, sees an over-GVM flag, fixes a typing slip and saves it", async ({ page }) => {
  await signInThroughPage(page, DEMO.planner.email);
  await page.goto("/rigs/new");
  await page.getByRole("button", { name: "Dual-cab ute and tandem caravan" }).click();
  await page.getByLabel("Rig name").fill("Test ute and van");
  // A typing slip: a mass that is not a number. The form says so and keeps every other value.
  await page.getByLabel("GVM, kg").fill("3150x");
  await page.getByRole("button", { name: "Add rig" }).click();
  await expect(page.getByText("Enter the GVM as a number.").first()).toBeVisible();
  await expect(page.getByLabel("GCM, kg")).toHaveValue(String(UTE_AND_CARAVAN.vehicle.gcmKg));
  await page.screenshot(shot("rig-form-error"));
  // Load the ute past its GVM: 900 kg of payload.
  await page.getByLabel("GVM, kg").fill(String(UTE_AND_CARAVAN.vehicle.gvmKg));
  await page.getByLabel("Payload in the vehicle, kg").fill("900");
  await page.getByRole("button", { name: "Add rig" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Test ute and van");
  await expect(page.getByTestId("check-gvm")).toContainText("Over");
  await page.screenshot(shot("rig-page"));
  await page.goto("/rigs");
  await expect(page.getByRole("row").filter({ hasText: "Test ute and van" })).toContainText("Over a rating");
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot(shot("rigs-list-phone"));
});

test("a viewer reads rigs but cannot add or change them", async ({ page, request }) => {
  await signInThroughPage(page, DEMO.viewer.email);
  await page.goto("/rigs");
  await expect(page.getByRole("link", { name: "New rig" })).toHaveCount(0);
  await page.goto("/rigs/new");
  await expect(page.getByText("Planners and owners add rigs")).toBeVisible();
  await signInThroughApi(request, DEMO.viewer.email);
  const refused = await request.post(`/api/organisations/${DEMO.teamId}/rigs`, { data: { name: "Sneaky", region: "AU", rig: UTE_AND_CARAVAN } });
  expect(refused.status()).toBe(403);
});
