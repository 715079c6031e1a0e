/**
 * Bad input at the REST API, as a client might send it by mistake or on purpose. Each gets a clear JSON
 * error with the right status (RFC 9110) and writes nothing.
 */
import { expect, test } from "@playwright/test";
import { DEMO, signInThroughApi } from "./support/accounts";

test.describe("bad input", () => {
  test.beforeEach(async ({ request }) => signInThroughApi(request, DEMO.owner.email));

  test("each malformed invitation request gets its own clear error and nothing is written", async ({ request }) => {
    const url = `/api/organisations/${DEMO.teamId}/invitations`;
    const before = (await (await request.get(url)).json()).invitations.length as number;
    const send = (body: string, type = "application/json") => request.post(url, { data: Buffer.from(body), headers: { "content-type": type } });

    const malformed = await send("{\"email\": ");
    expect(malformed.status()).toBe(400);
    expect(await malformed.json()).toEqual({ error: { code: "bad_request", message: "The request body is not valid JSON." } });

    const missing = await send("{}");
    expect(missing.status()).toBe(422);
    expect(Object.keys((await missing.json()).error.fields).sort()).toEqual(["email", "role"]);

    const extra = await send(JSON.stringify({ email: "a@e2e.example", role: "viewer", organisationId: "other" }));
    expect(extra.status()).toBe(422);
    expect((await extra.json()).error.message).toBe("These fields are not accepted here: organisationId.");

    const badEmail = await send(JSON.stringify({ email: '"x@attacker.example"@victim.example', role: "viewer" }));
    expect(badEmail.status()).toBe(422);
    expect((await badEmail.json()).error.fields.email).toEqual(["Enter a valid e-mail address, like name@example.com."]);

    const form = await send("email=a%40e2e.example&role=viewer", "application/x-www-form-urlencoded");
    expect(form.status()).toBe(415);

    const huge = await send(JSON.stringify({ email: "a@e2e.example", role: "viewer", pad: "x".repeat(200_000) }));
    expect(huge.status()).toBe(413);

    const after = (await (await request.get(url)).json()).invitations.length as number;
    expect(after).toBe(before);
  });

  test("invalid, reused and unknown invitation tokens are refused", async ({ request }) => {
    const bad = await request.post("/api/invitations/accept", { data: { token: "too-short" } });
    expect(bad.status()).toBe(422);
    const unknown = await request.post("/api/invitations/accept", { data: { token: "A".repeat(43) } });
    expect(unknown.status()).toBe(404);
    expect((await unknown.json()).error.message).toBe("This invitation link is not valid. Check that you copied all of it.");
  });

  test("another site cannot post to the API with the session cookie", async ({ request }) => {
    const response = await request.post(`/api/organisations/${DEMO.teamId}/invitations`, {
      data: { email: "csrf@e2e.example", role: "owner" },
      headers: { origin: "https://evil.example" },
    });
    expect(response.status()).toBe(403);
  });

  test("another organisation's records answer 404, not 403", async ({ request }) => {
    await signInThroughApi(request, DEMO.caravan.email);
    const response = await request.get(`/api/organisations/${DEMO.teamId}/members`);
    expect(response.status()).toBe(404);
  });
});

test("health reports the app and the database", async ({ request }) => {
  const health = await request.get("/api/health");
  expect(health.status()).toBe(200);
  expect(await health.json()).toMatchObject({ app: "up", database: "up" });
});
