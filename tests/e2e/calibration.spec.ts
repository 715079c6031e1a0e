import { expect, test } from "@playwright/test";
import { UTE_AND_CARAVAN } from "../../lib/thermal";
import { DEMO, signInThroughApi, signInThroughPage } from "./support/accounts";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });

/**
 * Calibrating a rig from readings on the rig page (docs/model.md §11). The rig is made for this test, so the
 * demo plans' rigs and their stored heat runs stay as they are for the other specs.
 */
test("a planner calibrates a rig from two readings on a demo route, sees the fit and clears it", async ({ page, request }) => {
  test.setTimeout(120_000);
  await signInThroughApi(request, DEMO.planner.email);
  const made = await request.post(`/api/organisations/${DEMO.teamId}/rigs`, { data: { name: `Calibration rig ${Date.now()}`, region: "AU", rig: UTE_AND_CARAVAN } });
  expect(made.status()).toBe(201);
  const rigId = ((await made.json()) as { rig: { id: string } }).rig.id;

  await page.setViewportSize({ width: 1440, height: 900 });
  await signInThroughPage(page, DEMO.planner.email);
  await page.goto(`/rigs/${rigId}`);
  const form = page.getByTestId("calibration-form");
  const routeSelect = form.getByLabel("Route the readings were taken on");
  const demoRoute = await routeSelect.locator("option", { hasText: "Tallowmere to Kestrel Gap" }).getAttribute("value");
  await routeSelect.selectOption(demoRoute!);

  // A typing slip: the form says which field and keeps what was typed.
  const first = form.getByTestId("reading-row").nth(0);
  await first.getByLabel("Brake").selectOption("front");
  await first.getByLabel("Along the route (km)").fill("41");
  await first.getByLabel("Temperature (°C)").fill("31O");
  await form.getByRole("button", { name: "Calibrate" }).click();
  await expect(first.getByText("Reading 1: enter the temperature read, in °C.")).toBeVisible();
  await expect(first.getByLabel("Along the route (km)")).toHaveValue("41");
  await first.getByLabel("Temperature (°C)").fill("310");

  await form.getByRole("button", { name: "Add a reading" }).click();
  const second = form.getByTestId("reading-row").nth(1);
  await second.getByLabel("Brake").selectOption("trailer");
  await second.getByLabel("Along the route (km)").fill("41");
  await second.getByLabel("Temperature (°C)").fill("380");
  await second.getByLabel("Minutes after stopping").fill("2");
  await form.getByRole("button", { name: "Calibrate" }).click();

  const result = page.getByTestId("calibration-result");
  await expect(result).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId("fitted-factors")).toContainText("Cooling factor (fitted)");
  await expect(page.getByTestId("fitted-factors")).toContainText("Engine-braking scale (fitted)");
  const readings = page.getByTestId("calibration-readings").getByRole("listitem");
  await expect(readings).toHaveCount(2);
  await expect(readings.nth(0)).toContainText("Reading 1: Front at 41.0 km, at once");
  await expect(readings.nth(0)).toContainText("Read310 °C");
  await expect(readings.nth(0)).toContainText("Model before");
  await expect(readings.nth(0)).toContainText("Model after");
  await expect(readings.nth(1)).toContainText("Trailer at 41.0 km, 2 min after stopping");
  // The route forecast again with the fit, beside the uncalibrated one.
  const forecast = page.getByTestId("calibration-forecast");
  await expect(forecast.getByRole("region", { name: "With the calibration" })).toContainText("Hottest front", { timeout: 60_000 });
  await expect(forecast.getByRole("region", { name: "Uncalibrated (typical values)" })).toContainText("Hottest front");
  await expect(forecast.getByRole("region", { name: "With the calibration" })).toContainText("from the rig's calibration of");
  await page.screenshot(shot("rig-calibration"));
  await page.setViewportSize({ width: 390, height: 844 });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.screenshot(shot("rig-calibration-phone"));

  // The stored calibration is part of the rig as the API answers it.
  const rig = (await (await request.get(`/api/rigs/${rigId}`)).json()) as { rig: { calibration: { readings: unknown[] } | null } };
  expect(rig.rig.calibration?.readings).toHaveLength(2);

  await page.getByRole("button", { name: "Clear the calibration" }).click();
  await page.getByRole("button", { name: "Clear it" }).click();
  await expect(page.getByText("Not calibrated")).toBeVisible();
  const after = (await (await request.get(`/api/rigs/${rigId}`)).json()) as { rig: { calibration: unknown } };
  expect(after.rig.calibration).toBeNull();
  expect((await request.delete(`/api/rigs/${rigId}`)).status()).toBe(204);
});

test("the calibration API refuses viewers and names the field of a bad reading", async ({ request }) => {
  await signInThroughApi(request, DEMO.planner.email);
  const made = await request.post(`/api/organisations/${DEMO.teamId}/rigs`, { data: { name: `Calibration API rig ${Date.now()}`, region: "AU", rig: UTE_AND_CARAVAN } });
  const rigId = ((await made.json()) as { rig: { id: string } }).rig.id;
  const routes = (await (await request.get(`/api/organisations/${DEMO.teamId}/routes`)).json()) as { routes: { id: string; name: string }[] };
  const routeId = routes.routes.find((r) => r.name === "Tallowmere to Kestrel Gap")!.id;

  const bad = await request.post(`/api/rigs/${rigId}/calibration`, { data: { routeId, readings: [{ position: "front", atKm: 41, tempC: 1200 }] } });
  expect(bad.status()).toBe(422);
  const body = (await bad.json()) as { error: { fields: Record<string, string[]> } };
  expect(body.error.fields["readings.0.tempC"]).toEqual(["The temperature (tempC) is at most 900 °C."]);

  const ok = await request.post(`/api/rigs/${rigId}/calibration`, { data: { routeId, readings: [{ position: "front", atKm: 41, tempC: 300 }] } });
  expect(ok.status()).toBe(201);
  const stored = ((await ok.json()) as { calibration: { fittedParameters: string[]; notes: string[] } }).calibration;
  expect(stored.fittedParameters).toEqual(["coolingFactor"]);
  expect(stored.notes.join(" ")).toContain("the cooling factor alone is fitted");

  await signInThroughApi(request, DEMO.viewer.email);
  expect((await request.post(`/api/rigs/${rigId}/calibration`, { data: { routeId, readings: [{ position: "front", atKm: 41, tempC: 300 }] } })).status()).toBe(403);
  expect((await request.delete(`/api/rigs/${rigId}/calibration`)).status()).toBe(403);
  const read = (await (await request.get(`/api/rigs/${rigId}`)).json()) as { rig: { calibration: { fittedParameters: string[] } | null } };
  expect(read.rig.calibration?.fittedParameters).toEqual(["coolingFactor"]);

  await signInThroughApi(request, DEMO.caravan.email);
  expect((await request.post(`/api/rigs/${rigId}/calibration`, { data: { routeId, readings: [{ position: "front", atKm: 41, tempC: 300 }] } })).status()).toBe(404);

  await signInThroughApi(request, DEMO.planner.email);
  expect((await request.delete(`/api/rigs/${rigId}/calibration`)).status()).toBe(204);
  expect((await request.delete(`/api/rigs/${rigId}`)).status()).toBe(204);
});
