import { expect, test } from "@playwright/test";
import { DEMO, signInThroughApi, signInThroughPage } from "./support/accounts";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });

/*
 * The plan's main job, as an operator does it: a three-rig convoy on the demo's Marrow Creek track (two
 * descents). The figures are the model's; what the test checks is the product's promise about them: flagged
 * descents are marked on the map and the profile, each piece of advice carries its re-run, and applying the
 * advice as a what-if really brings every brake below the caution line (the advice engine's own claim, checked
 * by re-running lib/thermal in the browser).
 */
test("an operator builds a three-rig convoy plan, reads the advice and proves it as a what-if", async ({ page }) => {
  test.setTimeout(180_000);
  await signInThroughPage(page, DEMO.planner.email);
  await page.goto("/plans/new");
  await page.getByLabel("Plan name").fill("E2E creek convoy");
  await page.getByLabel("Route").selectOption({ label: "Marrow Creek track (two segments)" });
  await page.getByLabel("Air temperature, °C").fill("30");
  const rigs: [string, string][] = [
    ["Lead ute (guide)", "Guide"],
    ["Ute and tandem van", "Van family"],
    ["Wagon and off-road camper", "Camper family"],
  ];
  for (const [i, [rig, driver]] of rigs.entries()) {
    if (i > 0) await page.getByRole("button", { name: "Add a rig" }).click();
    await page.getByLabel(`Rig ${i + 1}`, { exact: true }).selectOption({ label: rig });
    await page.getByLabel("Driver or participant").nth(i).fill(driver);
  }
  await page.getByRole("button", { name: "Create plan" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("E2E creek convoy");
  // A fresh plan runs the model with progress, then shows the results.
  await expect(page.getByTestId("plan-verdict")).toBeVisible({ timeout: 120_000 });
  await expect(page.getByTestId("plan-verdict")).toHaveAttribute("data-verdict", /clear|not advised/);
  // The matrix: two descents, one cell per rig, a worst rig on each.
  const matrix = page.getByTestId("convoy-matrix");
  await expect(matrix.locator("tbody tr")).toHaveCount(2);
  await expect(matrix.locator("tbody tr").first().locator("td")).toHaveCount(3);
  await expect(matrix.getByText("worst rig here")).toHaveCount(2);
  // Flagged descents: hot on the profile and the map, with the hottest point pinned.
  await expect(page.getByTestId("route-map")).toHaveAttribute("data-map-state", "idle", { timeout: 30_000 });
  await expect(page.getByTestId("map-pin").filter({ hasText: "Hottest" })).toHaveCount(1);
  await expect(page.getByTestId("heat-chart")).toBeVisible();
  await expect(page.getByText("Hot (fade likely): from").first()).toBeVisible();
  await page.screenshot(shot("plan-convoy"));

  // The van's advice: every piece carries its re-run result.
  await page.getByRole("tab", { name: /Van family/ }).click();
  const advice = page.getByTestId("descent-advice");
  await expect(advice).toHaveCount(2);
  await expect(advice.first()).toContainText("With this plan:");
  await expect(advice.first()).toContainText("As planned:");
  await expect(advice.first()).toContainText("Stopping from 80 km/h at the bottom");
  // Model 2 advises this van a held low gear and no cool-down stop, so the standstill cautions only show with a stop.
  if (await advice.first().getByText("When you stop with hot brakes").count()) await expect(advice.first()).toContainText("Don't sit with your foot on the brake pedal");
  await expect(page.getByTestId("plan-cautions")).toContainText("licensed mechanic");
  // As planned the descents are hot; applying the advice as a what-if brings them below caution.
  await page.getByRole("button", { name: "Try all this advice as a what-if" }).click();
  const whatIf = page.getByTestId("what-if-descent");
  await expect(whatIf).toHaveCount(2, { timeout: 30_000 });
  for (const cell of await whatIf.all()) {
    await expect(cell).toContainText("As planned");
    await expect(cell).toHaveAttribute("data-class", "cool");
  }
  await expect(page.getByText(/Recomputed in the browser in \d+ ms/)).toBeVisible();
  await page.screenshot(shot("plan-what-if"));

  // A what-if of one's own: a hotter day, kept as a scenario.
  await page.getByLabel("Air temperature, °C").fill("40");
  await page.getByLabel("Save this what-if as a scenario").fill("Hot day with the advice");
  await page.getByRole("button", { name: "Save scenario" }).click();
  await expect(page.getByRole("button", { name: "Hot day with the advice" })).toBeVisible();
  await page.reload();
  await page.getByRole("tab", { name: /Van family/ }).click();
  await page.getByRole("button", { name: "Open the what-if" }).click();
  await expect(page.getByRole("button", { name: "Hot day with the advice" })).toBeVisible();
});

test("a viewer reads the demo plan but cannot change it", async ({ page, request }) => {
  await signInThroughPage(page, DEMO.viewer.email);
  await page.getByRole("link", { name: "Marrow Creek shakedown" }).click();
  await expect(page.getByTestId("plan-verdict")).toBeVisible({ timeout: 120_000 });
  await expect(page.getByText("Read only: your role is viewer.")).toBeVisible();
  await expect(page.getByRole("link", { name: "Edit plan" })).toHaveCount(0);
  await expect(page.getByTestId("plan-cautions")).toContainText("licensed mechanic");
  await expect(page.getByTestId("plan-cautions")).toContainText("infrared thermometer");
  await page.getByText("How these figures are made").click();
  await expect(page.getByTestId("model-assumptions")).toContainText("estimates");
  await page.getByRole("button", { name: "Open the what-if" }).click();
  await expect(page.getByText("Viewers can try what-ifs; planners and owners save them as scenarios.")).toBeVisible();
  await page.screenshot(shot("plan-viewer"));
  const planId = page.url().split("/plans/")[1]!;
  await page.goto(`/plans/${planId}/edit`);
  await expect(page.getByText("Planners and owners change plans")).toBeVisible();
  await signInThroughApi(request, DEMO.viewer.email);
  const refused = await request.delete(`/api/plans/${planId}`);
  expect(refused.status()).toBe(403);
  const settings = { planRigId: "00000000-0000-4000-8000-000000000000", applyAdvice: true, descentSpeedMs: null, gear: null, ambientC: null, trailerGain: null, vehiclePayloadKg: null, trailerLoadKg: null, padFamily: null };
  const scenario = await request.post(`/api/plans/${planId}/scenarios`, { data: { name: "Sneaky", settings } });
  expect(scenario.status()).toBe(403);
});

/*
 * Model 2 on the demo's long pass: every peak carries its band, and where the model goes past a brake's
 * validity ceiling (the ute-and-van on descent 1, as planned) the page says so in words and prints no
 * temperature at or past the ceiling anywhere (docs/model.md, "Validity ceiling": the lowest ceiling is a
 * drum's, 590 °C).
 */
test("the Kestrel Gap crossing shows bands, runaway, and no temperature past a brake's ceiling", async ({ page }) => {
  test.setTimeout(120_000);
  await signInThroughPage(page, DEMO.planner.email);
  await page.getByRole("link", { name: "Kestrel Gap crossing", exact: true }).click();
  await expect(page.getByTestId("plan-verdict")).toBeVisible({ timeout: 120_000 });
  const matrix = page.getByTestId("convoy-matrix");
  // Peaks with their band: "about 240 °C (210–290)".
  await expect(matrix.getByText(/^about \d+ °C \(\d+–(\d+|beyond)\)$/).first()).toBeVisible();
  // The ute-and-van (second rig) on descent 1, as planned: runaway, beyond Fadeline's range.
  const vanCell = matrix.locator("tbody tr").first().getByTestId("matrix-cell").nth(1);
  await expect(vanCell).toHaveAttribute("data-class", "runaway");
  await expect(vanCell).toContainText("beyond Fadeline's range");
  await expect(vanCell).toContainText("Runaway (brakes may fail)");
  // The verdict says where the brakes may fail and where a band straddles a line.
  await expect(page.getByTestId("plan-verdict")).toContainText("the brakes may fail (runaway)");
  await expect(page.getByTestId("verdict-uncertainty")).toContainText("within the model's uncertainty");
  // The legend has the runaway class.
  await expect(page.getByText("Runaway (brakes may fail): beyond Fadeline's range").first()).toBeVisible();
  // The chart draws a band area behind each line, and its axis labels nothing at or past the ceiling.
  const chart = page.getByTestId("heat-chart");
  await expect(chart).toHaveAttribute("data-band", "plan");
  const bands = chart.locator(".heat-band path.recharts-area-area");
  await expect(bands.first()).toBeAttached();
  expect(await bands.count()).toBeGreaterThanOrEqual(2);
  expect((await bands.first().getAttribute("d"))?.length ?? 0).toBeGreaterThan(100);
  const ticks = (await chart.locator("svg text").allTextContents()).filter((t) => t.includes("°C")).map((t) => Number(t.replace(/[^\d-]/g, "")));
  expect(ticks.length).toBeGreaterThan(3);
  expect(ticks.filter((t) => t >= 590)).toEqual([]);
  // Its tooltip gives the band; at the hottest part of descent 1 the van's brakes are past the ceiling.
  const surface = chart.locator(".recharts-surface").first();
  await surface.scrollIntoViewIfNeeded();
  const box = (await surface.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.4);
  await page.mouse.move(box.x + box.width * 0.52, box.y + box.height * 0.45, { steps: 5 });
  await expect(page.getByTestId("heat-chart-tooltip")).toContainText(/about \d+ °C \(\d+–(\d+|beyond)\)|beyond Fadeline's range/);
  await expect(page.getByTestId("map-pin").filter({ hasText: "Hottest: beyond Fadeline's range" })).toHaveCount(1);
  // Nothing on the page prints a temperature at or past the lowest ceiling.
  const printed = [...(await page.locator("main").innerText()).matchAll(/(\d[\d,]*) °C/g)].map((m) => Number(m[1]!.replace(/,/g, "")));
  expect(printed.length).toBeGreaterThan(20);
  expect(printed.filter((c) => c >= 590)).toEqual([]);
  await page.screenshot(shot("plan-runaway"));
});

test("the what-if moves cooling and works out its band after the nominal run", async ({ page }) => {
  test.setTimeout(120_000);
  await signInThroughPage(page, DEMO.planner.email);
  await page.getByRole("link", { name: "Kestrel Gap crossing", exact: true }).click();
  await expect(page.getByTestId("plan-verdict")).toBeVisible({ timeout: 120_000 });
  await page.getByRole("button", { name: "Open the what-if" }).click();
  const frontShare = page.getByLabel("Front share of the vehicle's braking, fraction");
  await frontShare.fill("0.9");
  await expect(page.locator("#wi-front-share-error")).toHaveText("Between 0.5 and 0.8.");
  await frontShare.fill("");
  await page.getByLabel("Brake cooling, × the model's").fill("0.6");
  const peaks = page.getByTestId("what-if-peaks");
  await expect(peaks).toBeVisible({ timeout: 30_000 });
  await expect(peaks).toHaveAttribute("data-band", "ready", { timeout: 20_000 });
  await expect(page.getByTestId("heat-chart")).toHaveAttribute("data-band", "what-if");
  await expect(page.getByText(/Recomputed in the browser in \d+ ms; likely range in \d+ ms more/)).toBeVisible();
  // Less cooling: descent 4 runs hotter than planned for the worst rig shown.
  await expect(page.getByTestId("what-if-descent").nth(3)).toContainText(/What-if.*about \d+ °C \(\d+–\d+\)/s);
});
