/** When the SMTP server is unreachable the invitation is kept and the owner gets the link to pass on. */
import { eq } from "drizzle-orm";
import { expect, it } from "vitest";

process.env.SMTP_URL = "smtp://127.0.0.1:9"; // the discard port: nothing listens there on a test machine

const { getDb } = await import("../../db");
const { invitations } = await import("../../db/schema");
const { createInvitation } = await import("../../lib/server/invitations");
const { sendInvitationMail } = await import("../../lib/server/invitation-mail");
const { makeTeam, makeUser } = await import("./fixtures");

it("keeps the invitation and returns its link when the mail cannot be handed over", async () => {
  const owner = await makeUser("Offline Owner");
  const orgId = await makeTeam("Quiet Valley Tours", [{ userId: owner.userId, role: "owner" }]);
  const created = await createInvitation(getDb(), owner, orgId, { email: "later@test.example", role: "viewer" });
  const result = await sendInvitationMail(created);
  expect(result.mailSent).toBe(false);
  // the app's own address (NEXTAUTH_URL, which the test command sets from TEST_PORT)
  expect(process.env.NEXTAUTH_URL).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
  expect(result.link).toBe(`${process.env.NEXTAUTH_URL}/invite?token=${created.token}`);
  const rows = await getDb().select().from(invitations).where(eq(invitations.id, created.invitation.id));
  expect(rows).toHaveLength(1);
});
