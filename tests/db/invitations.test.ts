/**
 * Invitations end to end through the data-access layer and a real SMTP exchange (an in-process server). The
 * rules checked are the foundation issue's: single use, 7-day expiry, only a hash stored, the role comes from
 * the invitation, bound to the invited address; OWASP ASVS 6.4.1 and 6.5.1 ask for the same of such links.
 */
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startSmtpCapture, linkIn, tokenOf } from "../support/smtp-capture";

const smtp = await startSmtpCapture();
process.env.SMTP_URL = smtp.url;

const { getDb } = await import("../../db");
const { invitations, memberships, users } = await import("../../db/schema");
const { createInvitation, listInvitations, revokeInvitation, INVITATION_LIFETIME_DAYS } = await import("../../lib/server/invitations");
const { sendInvitationMail } = await import("../../lib/server/invitation-mail");
const { acceptInvitationAsUser, acceptInvitationWithNewAccount } = await import("../../lib/server/accept-invitation");
const { hashToken } = await import("../../lib/server/tokens");
const { makeTeam, makeUser } = await import("./fixtures");

let owner: Awaited<ReturnType<typeof makeUser>>;
let orgId: string;

beforeAll(async () => {
  owner = await makeUser("Ines Owner");
  orgId = await makeTeam("Cinder Range Tours", [{ userId: owner.userId, role: "owner" }]);
});
afterAll(() => smtp.close());

async function invite(email: string, role: "owner" | "planner" | "viewer" = "planner") {
  const created = await createInvitation(getDb(), owner, orgId, { email, role });
  const sent = await sendInvitationMail(created);
  return { created, sent };
}

describe("invitations", () => {
  it("mails a link whose token is stored only as its SHA-256", async () => {
    const { created, sent } = await invite("new.planner@test.example");
    expect(sent.mailSent).toBe(true);
    const mail = smtp.messages.find((m) => m.to.includes("new.planner@test.example"));
    expect(mail?.subject).toBe("You are invited to Cinder Range Tours on Fadeline");
    const token = tokenOf(linkIn(mail, "/invite"));
    expect(token).toBe(created.token);
    const [row] = await getDb().select().from(invitations).where(eq(invitations.id, created.invitation.id));
    expect(row!.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(row)).not.toContain(token);
    const lifetimeDays = (row!.expiresAt.getTime() - row!.createdAt.getTime()) / 86_400_000;
    expect(lifetimeDays).toBeCloseTo(INVITATION_LIFETIME_DAYS, 3);
  });

  it("a new person accepts with a new account and gets the invitation's role; the link then stops working", async () => {
    const { created } = await invite("fresh.viewer@test.example", "viewer");
    const joined = await acceptInvitationWithNewAccount(getDb(), created.token, { name: "Fresh Viewer", password: "a long enough passphrase" });
    expect(joined).toMatchObject({ organisationId: orgId, role: "viewer", email: "fresh.viewer@test.example" });
    const [user] = await getDb().select().from(users).where(eq(users.email, "fresh.viewer@test.example"));
    expect(user!.emailVerifiedAt).not.toBeNull();
    expect(user!.activeOrganisationId).toBe(orgId);
    const roles = await getDb().select().from(memberships).where(eq(memberships.userId, user!.id));
    expect(roles.map((r) => r.role).sort()).toEqual(["owner", "viewer"]); // personal organisation + the invitation
    await expect(acceptInvitationWithNewAccount(getDb(), created.token, { name: "Again", password: "a long enough passphrase" })).rejects.toMatchObject({
      code: "gone",
      message: "This invitation has already been used. Sign in to reach the organisation.",
    });
  });

  it("an existing user accepts only with the address it was sent to", async () => {
    const invitee = await makeUser("Kit Invitee");
    const stranger = await makeUser("Someone Else");
    const { created } = await invite(invitee.email, "planner");
    await expect(acceptInvitationAsUser(getDb(), stranger, created.token)).rejects.toMatchObject({ code: "forbidden" });
    const joined = await acceptInvitationAsUser(getDb(), invitee, created.token);
    expect(joined.role).toBe("planner");
    await expect(acceptInvitationAsUser(getDb(), invitee, created.token)).rejects.toMatchObject({ code: "gone" });
  });

  it("a double click accepts once", async () => {
    const invitee = await makeUser("Double Clicker");
    const { created } = await invite(invitee.email);
    const results = await Promise.allSettled([
      acceptInvitationAsUser(getDb(), invitee, created.token),
      acceptInvitationAsUser(getDb(), invitee, created.token),
    ]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
  });

  it("refuses expired, withdrawn and unknown links with their own message", async () => {
    const a = await invite("late@test.example");
    await getDb().update(invitations).set({ expiresAt: sql`now() - interval '1 minute'` }).where(eq(invitations.id, a.created.invitation.id));
    await expect(acceptInvitationWithNewAccount(getDb(), a.created.token, { name: "Late", password: "a long enough passphrase" })).rejects.toMatchObject({
      code: "gone",
      message: "This invitation has expired. Ask the organisation's owner for a new one.",
    });
    const b = await invite("withdrawn@test.example");
    await revokeInvitation(getDb(), owner, orgId, b.created.invitation.id);
    await expect(acceptInvitationWithNewAccount(getDb(), b.created.token, { name: "W", password: "a long enough passphrase" })).rejects.toMatchObject({
      message: "This invitation was withdrawn. Ask the organisation's owner for a new one.",
    });
    await expect(acceptInvitationWithNewAccount(getDb(), "A".repeat(43), { name: "X", password: "a long enough passphrase" })).rejects.toMatchObject({ code: "not_found" });
    const statuses = Object.fromEntries((await listInvitations(getDb(), owner, orgId)).map((i) => [i.email, i.status]));
    expect(statuses["late@test.example"]).toBe("expired");
    expect(statuses["withdrawn@test.example"]).toBe("revoked");
  });

  it("inviting the same address again withdraws the earlier link", async () => {
    const first = await invite("twice@test.example");
    const second = await invite("twice@test.example", "viewer");
    await expect(acceptInvitationWithNewAccount(getDb(), first.created.token, { name: "T", password: "a long enough passphrase" })).rejects.toMatchObject({ code: "gone" });
    await expect(acceptInvitationWithNewAccount(getDb(), second.created.token, { name: "T", password: "a long enough passphrase" })).resolves.toMatchObject({ role: "viewer" });
  });

  it("tells the owner when the address is already a member", async () => {
    await expect(createInvitation(getDb(), owner, orgId, { email: owner.email, role: "viewer" })).rejects.toMatchObject({
      code: "conflict",
      fields: { email: ["Already a member."] },
    });
  });

  it("escapes names in the mail body and keeps line breaks out of the subject", async () => {
    const evil = await makeUser("Evil\r\nBcc: victim@test.example <b>bold</b>");
    const team = await makeTeam("Club <script>x</script>\r\nBcc: a@b.example", [{ userId: evil.userId, role: "owner" }]);
    const created = await createInvitation(getDb(), evil, team, { email: "target@test.example", role: "viewer" });
    await sendInvitationMail(created);
    const mail = smtp.messages.find((m) => m.to.includes("target@test.example"))!;
    expect(mail.to).toEqual(["target@test.example"]);
    expect(mail.headers.has("bcc")).toBe(false);
    expect(mail.subject).not.toMatch(/[\r\n]/);
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).toContain("&#60;script&#62;");
  });
});
