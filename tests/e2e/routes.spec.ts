import { readFileSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { GRADE_BANDS } from "../../components/route-map/grade-colours";
import { DEMO, signInThroughApi, signInThroughPage } from "./support/accounts";
import { countMapPixels } from "./support/map-pixels";
import { pathPoints, rollingRoad, toGpx } from "../unit/route/synthetic";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });
const FILE = "tests/fixtures/gpx/kestrel-gap-1-1.gpx";

/** Drops a file on the drop zone the way a browser does: a drop event whose DataTransfer holds the file. */
async function dropFile(page: Page, path: string, name: string) {
  const b64 = readFileSync(path).toString("base64");
  const transfer = await page.evaluateHandle(
    ({ b64, name }) => {
      const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
      const dt = new DataTransfer();
      dt.items.add(new File([bytes], name, { type: "application/gpx+xml" }));
      return dt;
    },
    { b64, name },
  );
  for (const type of ["dragenter", "dragover", "drop"]) await page.dispatchEvent("[data-testid=upload-zone]", type, { dataTransfer: transfer });
}

test("a planner drops a GPX, sees the preview, saves it and reads the route page with map and profile", async ({ page }) => {
  await signInThroughPage(page, DEMO.planner.email);
  await page.goto("/routes");
  await dropFile(page, FILE, "kestrel-gap.gpx");
  const card = page.getByTestId("preview-card").first();
  await expect(card.getByTestId("preview-figures")).toContainText("Points");
  await expect(card).toContainText("This file has 2 tracks");
  await page.screenshot(shot("routes-preview"));
  await card.getByRole("button", { name: "Save route" }).click();
  await expect(card.getByText(/^(Saved|Already uploaded)$/)).toBeVisible({ timeout: 20_000 });
  const link = card.getByRole("link");
  const name = (await link.textContent())!;
  await expect(page.getByRole("row").filter({ hasText: name })).toBeVisible(); // the table updated without a reload
  await link.click();

  await expect(page.getByRole("heading", { level: 1 })).toHaveText(name);
  const map = page.getByTestId("route-map");
  await expect(map).toHaveAttribute("data-map-state", "idle", { timeout: 30_000 });
  const descentColours = GRADE_BANDS.filter((b) => b.atMost < -0.02).map((b) => b.colour);
  const counts = await countMapPixels(page, descentColours);
  const routePixels = Object.values(counts).reduce((a, b) => a + b, 0);
  expect(routePixels, JSON.stringify(counts)).toBeGreaterThan(300); // the grade-coloured line is painted
  await expect(page.getByRole("table").last()).toContainText("Steepest 1 km");
  await page.screenshot(shot("route-page"));

  // Hovering the profile moves the marker on the map.
  const profile = page.getByTestId("elevation-profile");
  await profile.scrollIntoViewIfNeeded();
  const box = (await profile.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.25, box.y + box.height / 2);
  const marker = page.getByTestId("route-map-hover-marker");
  await expect(marker).toBeVisible();
  const first = await marker.boundingBox();
  await page.mouse.move(box.x + box.width * 0.8, box.y + box.height / 2);
  await expect.poll(async () => (await marker.boundingBox())?.x).not.toBe(first?.x);
  await page.screenshot({ path: "tests/e2e/screenshots/route-hover.png" });
});

test("a viewer sees no upload control and the upload API refuses them", async ({ page }) => {
  await signInThroughPage(page, DEMO.viewer.email);
  await page.goto("/routes");
  await expect(page.getByTestId("upload-zone")).toHaveCount(0);
  await expect(page.getByText("planners and owners upload them")).toBeVisible();
  const refused = await page.request.post(`/api/organisations/${DEMO.teamId}/routes?fileName=x.gpx`, {
    data: readFileSync(FILE),
    headers: { "content-type": "application/gpx+xml" },
  });
  expect(refused.status()).toBe(403);
  await page.screenshot(shot("routes-viewer"));
});

test.describe("hostile uploads", () => {
  test.beforeEach(({ request }) => signInThroughApi(request, DEMO.planner.email));
  const upload = (request: import("@playwright/test").APIRequestContext, body: Buffer | string, type = "application/gpx+xml") =>
    request.post(`/api/organisations/${DEMO.teamId}/routes?fileName=hostile.gpx`, { data: typeof body === "string" ? Buffer.from(body) : body, headers: { "content-type": type } });

  test("each gets a clear 4xx and nothing is stored", async ({ request }) => {
    const before = ((await (await request.get(`/api/organisations/${DEMO.teamId}/routes`)).json()).routes as unknown[]).length;
    const cases: [string, Buffer | string, RegExp][] = [
      ["external entity", readFileSync("tests/fixtures/gpx/hostile/c01-xxe-file.gpx"), /DOCTYPE/],
      ["billion laughs", readFileSync("tests/fixtures/gpx/hostile/c03-billion-laughs.gpx"), /DOCTYPE/],
      ["a PNG renamed .gpx", readFileSync("tests/fixtures/gpx/hostile/c12-png-renamed.gpx"), /PNG image/],
      ["an empty file", "", /empty/],
      ["malformed XML", readFileSync("tests/fixtures/gpx/hostile/c11-truncated.gpx"), /./],
      ["50,000 attributes", `<gpx xmlns="http://www.topografix.com/GPX/1/1"><trk ${Array.from({ length: 50_000 }, (_, i) => `a${i}="1"`).join(" ")}/></gpx>`, /attributes/],
      ["one point", `<gpx xmlns="http://www.topografix.com/GPX/1/1"><trk><trkseg><trkpt lat="1" lon="1"><ele>5</ele></trkpt></trkseg></trk></gpx>`, /./],
    ];
    for (const [what, body, message] of cases) {
      const response = await upload(request, body);
      expect(response.status(), what).toBeGreaterThanOrEqual(400);
      expect(response.status(), what).toBeLessThan(500);
      expect((await response.json()).error.message, what).toMatch(message);
    }
    const big = await request.post(`/api/organisations/${DEMO.teamId}/routes?fileName=big.gpx`, { data: Buffer.alloc(21 * 1024 * 1024, 32), headers: { "content-type": "application/gpx+xml" } });
    expect(big.status()).toBe(413);
    const textPlain = await upload(request, readFileSync(FILE), "text/plain");
    expect(textPlain.status()).toBe(415);
    const after = ((await (await request.get(`/api/organisations/${DEMO.teamId}/routes`)).json()).routes as unknown[]).length;
    expect(after).toBe(before);
  });

  test("other requests still answer within a second while hostile and large files are read", async ({ request }) => {
    const depth = 100_000;
    const deep = `<?xml version="1.0"?><gpx xmlns="http://www.topografix.com/GPX/1/1"><extensions>${"<x>".repeat(depth)}${"</x>".repeat(depth)}</extensions></gpx>`;
    const xy = Array.from({ length: 120_000 }, (_, i) => [i * 12, 300 * Math.sin(i / 900)] as [number, number]);
    const large = toGpx([pathPoints(xy, (d) => rollingRoad(d))], "Long test road");
    const pending = [upload(request, deep), upload(request, large)];
    const waits: number[] = [];
    for (let i = 0; i < 5; i++) {
      const started = Date.now();
      expect((await request.get("/api/health")).status()).toBe(200);
      waits.push(Date.now() - started);
      await new Promise((r) => setTimeout(r, 150));
    }
    expect(Math.max(...waits), JSON.stringify(waits)).toBeLessThan(1000);
    const [deepResult, largeResult] = await Promise.all(pending);
    expect(deepResult!.status()).toBe(422);
    expect([200, 201]).toContain(largeResult!.status());
  });
});
