import { defineConfig, devices } from "@playwright/test";

const port = Number(process.env.TEST_PORT ?? 3100);
const baseURL = `http://127.0.0.1:${port}`;

/** Debian's Chromium (never a downloaded browser); WebGL through SwiftShader for the map. */
const chromiumArgs = [
  "--no-sandbox",
  "--disable-dev-shm-usage",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
  "--use-angle=swiftshader",
  "--enable-unsafe-swiftshader",
];

export default defineConfig({
  testDir: "./tests/e2e",
  testMatch: "**/*.spec.ts",
  outputDir: "./test-results",
  reporter: [["list"]],
  workers: 2,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  use: {
    baseURL,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
    launchOptions: { executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: chromiumArgs },
  },
  projects: [{ name: "debian-chromium", use: { ...devices["Desktop Chrome"], channel: undefined } }],
  webServer: {
    command: `node_modules/.bin/next start -H 127.0.0.1 -p ${port}`,
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: "ignore",
    stderr: "pipe",
  },
});
