/**
 * Sign-up, confirmation, sign-in and password reset against PostgreSQL and a real SMTP exchange. Rules from
 * the OWASP Authentication Cheat Sheet (generic answers, no account enumeration) and the foundation issue
 * (10 failed sign-ins per 15 minutes per account and per client address, counted in PostgreSQL).
 */
import { count, eq, sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { linkIn, startSmtpCapture, tokenOf } from "../support/smtp-capture";

const smtp = await startSmtpCapture();
process.env.SMTP_URL = smtp.url;

const { getDb } = await import("../../db");
const { memberships, organisations, signInAttempts, users } = await import("../../db/schema");
const { signUp, confirmEmail, requestPasswordReset, completePasswordReset } = await import("../../lib/server/accounts");
const { checkCredentials, SIGN_IN_ERRORS } = await import("../../lib/server/sign-in");
const { SIGN_IN_LIMIT } = await import("../../lib/server/rate-limit");
const { FIXTURE_PASSWORD, makeUser } = await import("./fixtures");

afterAll(() => smtp.close());
const mailsTo = (email: string) => smtp.messages.filter((m) => m.to.includes(email));
let ipCounter = 0;
const freshIp = () => `198.51.100.${++ipCounter}`; // TEST-NET-2 (RFC 5737)

describe("sign-up", () => {
  it("creates an unconfirmed user who owns a personal organisation, and mails a confirmation link", async () => {
    await signUp(getDb(), { name: "Noor Newcomer", email: "noor@test.example", password: "correct horse battery" }, freshIp());
    const [user] = await getDb().select().from(users).where(eq(users.email, "noor@test.example"));
    expect(user!.emailVerifiedAt).toBeNull();
    expect(user!.passwordHash).toMatch(/^\$2[aby]\$11\$/); // bcrypt, cost 11 (OWASP: at least 10)
    const [org] = await getDb()
      .select({ name: organisations.name, kind: organisations.kind, role: memberships.role })
      .from(memberships)
      .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
      .where(eq(memberships.userId, user!.id));
    expect(org).toEqual({ name: "Noor Newcomer (personal)", kind: "personal", role: "owner" });
    await expect(checkCredentials(getDb(), { email: "noor@test.example", password: "correct horse battery" }, freshIp())).rejects.toThrow(
      SIGN_IN_ERRORS.unconfirmed,
    );
    const token = tokenOf(linkIn(mailsTo("noor@test.example")[0], "/confirm-email"));
    await expect(confirmEmail(getDb(), token)).resolves.toEqual({ email: "noor@test.example" });
    await expect(confirmEmail(getDb(), token)).rejects.toMatchObject({ code: "gone" }); // single use
    const signedIn = await checkCredentials(getDb(), { email: "NOOR@test.example ", password: "correct horse battery" }, freshIp());
    expect(signedIn).toMatchObject({ email: "noor@test.example", name: "Noor Newcomer" });
  });

  it("an address that already has an account gets a notice instead, and nothing changes", async () => {
    const existing = await makeUser("Already Here");
    const before = await getDb().select().from(users).where(eq(users.id, existing.userId));
    await signUp(getDb(), { name: "Impostor", email: existing.email, password: "another long phrase" }, freshIp());
    const after = await getDb().select().from(users).where(eq(users.id, existing.userId));
    expect(after).toEqual(before);
    expect(mailsTo(existing.email).map((m) => m.subject)).toEqual(["Someone tried to create a Fadeline account with your address"]);
  });

  it("parallel sign-ups with one address create one account", async () => {
    const input = { name: "Racer", email: "racer@test.example", password: "a long racing phrase" };
    await Promise.all([signUp(getDb(), input, freshIp()), signUp(getDb(), input, freshIp()), signUp(getDb(), input, freshIp())]);
    const [row] = await getDb().select({ n: count() }).from(users).where(eq(users.email, "racer@test.example"));
    expect(row!.n).toBe(1);
  });
});

describe("sign-in", () => {
  it("answers the same (null) for an unknown address, a wrong password and malformed input", async () => {
    const user = await makeUser("Known Person");
    const ip = freshIp();
    await expect(checkCredentials(getDb(), { email: "nobody@test.example", password: FIXTURE_PASSWORD }, ip)).resolves.toBeNull();
    await expect(checkCredentials(getDb(), { email: user.email, password: "not the password" }, ip)).resolves.toBeNull();
    await expect(checkCredentials(getDb(), { email: "not an address", password: "x" }, ip)).resolves.toBeNull();
    await expect(checkCredentials(getDb(), { email: user.email, password: "x".repeat(1025) }, ip)).resolves.toBeNull();
    await expect(checkCredentials(getDb(), { email: user.email, password: FIXTURE_PASSWORD }, ip)).resolves.toMatchObject({ id: user.userId });
  });

  it(`blocks an account after ${SIGN_IN_LIMIT.failures} failures in ${SIGN_IN_LIMIT.windowMinutes} minutes, from any address`, async () => {
    const user = await makeUser("Targeted Person");
    for (let i = 0; i < SIGN_IN_LIMIT.failures; i++) {
      await expect(checkCredentials(getDb(), { email: user.email, password: `guess ${i}` }, freshIp())).resolves.toBeNull();
    }
    // Even the right password from a new address is refused while the account is blocked.
    await expect(checkCredentials(getDb(), { email: user.email, password: FIXTURE_PASSWORD }, freshIp())).rejects.toThrow(SIGN_IN_ERRORS.rateLimited);
    // Failures older than the window no longer count.
    await getDb().update(signInAttempts).set({ createdAt: sql`now() - interval '16 minutes'` }).where(eq(signInAttempts.email, user.email));
    await expect(checkCredentials(getDb(), { email: user.email, password: FIXTURE_PASSWORD }, freshIp())).resolves.toMatchObject({ id: user.userId });
  });

  it("blocks a client address that tries many accounts, and counts unknown addresses too", async () => {
    const ip = freshIp();
    for (let i = 0; i < SIGN_IN_LIMIT.failures; i++) {
      await checkCredentials(getDb(), { email: `stuffing${i}@test.example`, password: "leaked password 1" }, ip);
    }
    const victim = await makeUser("Victim");
    await expect(checkCredentials(getDb(), { email: victim.email, password: FIXTURE_PASSWORD }, ip)).rejects.toThrow(SIGN_IN_ERRORS.rateLimited);
    await expect(checkCredentials(getDb(), { email: victim.email, password: FIXTURE_PASSWORD }, freshIp())).resolves.not.toBeNull();
  });
});

describe("password reset", () => {
  it("mails a single-use link; the new password works, the old does not, and old sessions end", async () => {
    const user = await makeUser("Forgetful");
    const [before] = await getDb().select({ v: users.sessionVersion }).from(users).where(eq(users.id, user.userId));
    await requestPasswordReset(getDb(), user.email);
    await requestPasswordReset(getDb(), "nobody.at.all@test.example"); // answers the same, sends nothing
    expect(mailsTo("nobody.at.all@test.example")).toHaveLength(0);
    const token = tokenOf(linkIn(mailsTo(user.email).at(-1), "/reset-password"));
    await completePasswordReset(getDb(), token, "my brand new passphrase");
    await expect(completePasswordReset(getDb(), token, "and another passphrase")).rejects.toMatchObject({ code: "gone" });
    await expect(checkCredentials(getDb(), { email: user.email, password: FIXTURE_PASSWORD }, freshIp())).resolves.toBeNull();
    await expect(checkCredentials(getDb(), { email: user.email, password: "my brand new passphrase" }, freshIp())).resolves.not.toBeNull();
    const [after] = await getDb().select({ v: users.sessionVersion }).from(users).where(eq(users.id, user.userId));
    expect(after!.v).toBe(before!.v + 1);
  });

  it("stops mailing one address after 5 messages in an hour", async () => {
    const user = await makeUser("Flooded");
    for (let i = 0; i < 8; i++) await requestPasswordReset(getDb(), user.email);
    expect(mailsTo(user.email)).toHaveLength(5);
  });
});
