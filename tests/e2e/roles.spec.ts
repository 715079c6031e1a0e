import { expect, test } from "@playwright/test";
import { DEMO, signInThroughApi, signInThroughPage } from "./support/accounts";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });

test("a viewer cannot reach owner pages, and the API refuses owner actions", async ({ page }) => {
  await signInThroughPage(page, DEMO.viewer.email);
  await page.goto("/organisation");
  await expect(page.getByTestId("active-role")).toHaveText("Your role: viewer");
  await expect(page.getByRole("heading", { name: "Invitations" })).toHaveCount(0);
  await expect(page.getByRole("combobox", { name: /Role of/ })).toHaveCount(0);
  await expect(page.getByText("Only owners can rename the organisation.")).toBeVisible();
  await page.screenshot(shot("organisation-viewer"));
  await page.goto("/organisation/audit");
  await expect(page.getByText("Owners only")).toBeVisible();
  await page.screenshot(shot("audit-viewer"));

  const api = page.request;
  const invite = await api.post(`/api/organisations/${DEMO.teamId}/invitations`, { data: { email: "x@e2e.example", role: "owner" } });
  expect(invite.status()).toBe(403);
  expect((await invite.json()).error.code).toBe("forbidden");
  const promote = await api.patch(`/api/organisations/${DEMO.teamId}/members/${DEMO.viewer.id}`, { data: { role: "owner" } });
  expect(promote.status()).toBe(403);
  expect((await api.get(`/api/organisations/${DEMO.teamId}/audit-events`)).status()).toBe(403);
  const members = (await (await api.get(`/api/organisations/${DEMO.teamId}/members`)).json()).members as { userId: string; role: string }[];
  expect(members.find((m) => m.userId === DEMO.viewer.id)?.role).toBe("viewer");
});

test("a direct POST of the owner's rename action is refused for a viewer and for nobody", async ({ browser, baseURL }) => {
  const ownerContext = await browser.newContext();
  const ownerPage = await ownerContext.newPage();
  // The caravan owner's own organisation serves for the positive control, so the team's name never changes.
  await signInThroughPage(ownerPage, DEMO.caravan.email);
  const scratchId = (await (await ownerPage.request.get("/api/account")).json()).activeOrganisationId as string;
  await ownerPage.goto("/organisation");
  // Every hidden field React rendered for the rename form: the action reference, its bound state and key.
  const fields = await ownerPage.locator("form").filter({ has: ownerPage.getByRole("button", { name: "Rename" }) }).evaluate((form) =>
    Object.fromEntries([...new FormData(form as HTMLFormElement).entries()].map(([k, v]) => [k, String(v)])),
  );
  expect(Object.keys(fields).some((k) => k.startsWith("$ACTION"))).toBe(true);
  const post = (request: import("@playwright/test").APIRequestContext, organisationId: string, name: string) =>
    request.post("/organisation", { multipart: { ...fields, organisationId, name }, headers: { origin: baseURL! }, maxRedirects: 0 });
  const nameOf = async (id: string) => (await (await ownerPage.request.get(`/api/organisations/${id}`)).json()).organisation?.name;

  // Control: replayed by the owner, the same POST does rename.
  expect((await post(ownerPage.request, scratchId, "Action check renamed")).status()).toBeLessThan(500);
  expect(await nameOf(scratchId)).toBe("Action check renamed");
  await ownerPage.request.patch(`/api/organisations/${scratchId}`, { data: { name: "Cass Holloway (personal)" } });

  for (const who of ["viewer", "nobody"] as const) {
    const context = await browser.newContext();
    if (who === "viewer") await signInThroughApi(context.request, DEMO.viewer.email);
    expect((await post(context.request, DEMO.teamId, `Taken over by ${who}`)).status()).toBeLessThan(500);
    await context.close();
  }
  const viewer = await browser.newContext();
  await signInThroughApi(viewer.request, DEMO.viewer.email);
  expect((await (await viewer.request.get(`/api/organisations/${DEMO.teamId}`)).json()).organisation.name).toBe(DEMO.teamName);
  await viewer.close();
  await ownerContext.close();
});

test("a forged role or user id in the session update changes nothing", async ({ request }) => {
  await signInThroughApi(request, DEMO.viewer.email);
  const { csrfToken } = (await (await request.get("/api/auth/csrf")).json()) as { csrfToken: string };
  const update = await request.post("/api/auth/session", {
    data: { csrfToken, data: { user: { id: DEMO.owner.id, role: "owner", sessionVersion: 0 } } },
  });
  expect(update.ok()).toBe(true);
  const account = (await (await request.get("/api/account")).json()) as { user: { id: string }; organisations: { id: string; role: string }[] };
  expect(account.user.id).toBe(DEMO.viewer.id);
  expect(account.organisations.find((o) => o.id === DEMO.teamId)?.role).toBe("viewer");
  expect((await request.post(`/api/organisations/${DEMO.teamId}/invitations`, { data: { email: "y@e2e.example", role: "viewer" } })).status()).toBe(403);
});

test("the internal middleware header does not open the signed-in area (docs/security.md A1)", async ({ request }) => {
  for (const value of ["middleware", "proxy", "middleware:middleware:middleware:middleware:middleware"]) {
    const page = await request.get("/organisation", { headers: { "x-middleware-subrequest": value }, maxRedirects: 0 });
    expect(page.status()).toBe(307);
    const api = await request.get(`/api/organisations/${DEMO.teamId}/members`, { headers: { "x-middleware-subrequest": value } });
    expect(api.status()).toBe(401);
  }
});
