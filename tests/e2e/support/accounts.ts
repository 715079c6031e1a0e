import { expect, type APIRequestContext, type Page } from "@playwright/test";

/** The seeded demo scenario (db/seed.ts). */
export const DEMO = {
  password: "switchback-demo-2026",
  teamId: "6f1d3c2a-0b7e-4c1a-9d55-3a1e0c7b9d01",
  teamName: "Tallowmere Tag-Along Tours",
  owner: { email: "olive.marsh@tallowmere-tours.example", id: "0b9e7c35-5a3f-4e8e-8d1c-6a9f0e2b7a11" },
  planner: { email: "rafe.dunmore@tallowmere-tours.example", id: "1c8f6d44-6b4e-4f9f-9e2d-7b0a1f3c8b22" },
  viewer: { email: "vera.quill@tallowmere-tours.example", id: "2d7a5e53-7c5f-4a0a-8f3e-8c1b2a4d9c33" },
  caravan: { email: "cass.holloway@caravan-owner.example", id: "3e6b4f62-8d6a-4b1b-9a4f-9d2c3b5e0d44" },
} as const;

export const uniqueEmail = (label: string) => `${label}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}@e2e.example`;

/** Signs in through the sign-in page, as a person would. */
export async function signInThroughPage(page: Page, email: string, password: string = DEMO.password) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/plans$/);
}

/** Signs a request context in through next-auth's credentials endpoint (for API-only checks). */
export async function signInThroughApi(request: APIRequestContext, email: string, password: string = DEMO.password) {
  const { csrfToken } = (await (await request.get("/api/auth/csrf")).json()) as { csrfToken: string };
  const response = await request.post("/api/auth/callback/credentials", {
    form: { csrfToken, email, password, json: "true" },
  });
  expect(response.ok(), "credentials sign-in").toBe(true);
  const account = await request.get("/api/account");
  expect(account.status()).toBe(200);
}
