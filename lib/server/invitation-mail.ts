import "server-only";
import type { CreatedInvitation } from "./invitations";
import { appUrl, sendMail } from "./mail";
import { invitationMail } from "./mail-templates";

/**
 * Mails a new invitation. A mail failure does not undo the invitation: the owner gets the link to pass on
 * by hand, and `mailSent: false` says so.
 */
export async function sendInvitationMail(created: CreatedInvitation): Promise<{ link: string; mailSent: boolean }> {
  const link = appUrl(`/invite?token=${created.token}`);
  try {
    await sendMail(
      invitationMail({
        to: created.invitation.email,
        organisationName: created.organisationName,
        inviterName: created.inviterName,
        role: created.invitation.role,
        link,
        expiresAt: created.invitation.expiresAt,
      }),
    );
    return { link, mailSent: true };
  } catch (error) {
    console.error("[mail] invitation not sent:", error instanceof Error ? error.message : error);
    return { link, mailSent: false };
  }
}
