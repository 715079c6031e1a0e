import "server-only";
import { ROLE_LABELS, type Role } from "@/lib/auth/permissions";
import type { OutgoingMail } from "./mail";

/** HTML-escapes text that came from users (names, organisation names) before it goes into a mail body. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** Removes line breaks and caps length, for text that ends up in a subject line. */
function oneLine(text: string, max = 80): string {
  return text.replace(/[\r\n\t]+/g, " ").slice(0, max);
}

function layout(title: string, paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${p}</p>`).join("");
  return `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#1d2a2e;max-width:560px">
<h1 style="font-size:20px">${escapeHtml(title)}</h1>${body}
<p><a href="${escapeHtml(link.href)}" style="background:#1f5a4f;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(link.label)}</a></p>
<p style="color:#5b6b70;font-size:13px">Or paste this address into your browser: ${escapeHtml(link.href)}</p>
<p style="color:#5b6b70;font-size:13px">Fadeline: brake-heat planning for heavy rigs.</p></body></html>`;
}

export function invitationMail(input: {
  to: string;
  organisationName: string;
  inviterName: string;
  role: Role;
  link: string;
  expiresAt: Date;
}): OutgoingMail {
  const org = oneLine(input.organisationName);
  const inviter = oneLine(input.inviterName);
  const role = ROLE_LABELS[input.role].toLowerCase();
  const expires = input.expiresAt.toUTCString();
  return {
    to: input.to,
    subject: `You are invited to ${org} on Fadeline`,
    text: `${inviter} invited you to join ${org} on Fadeline as a ${role}.\n\nAccept: ${input.link}\n\nThe link works once and expires on ${expires}. If you did not expect this, ignore this mail.`,
    html: layout(
      `Join ${org} on Fadeline`,
      [
        `${escapeHtml(inviter)} invited you to join <strong>${escapeHtml(org)}</strong> as a ${role}.`,
        `The link works once and expires on ${escapeHtml(expires)}. If you did not expect this, ignore this mail.`,
      ],
      { href: input.link, label: "Accept the invitation" },
    ),
  };
}

export function confirmEmailMail(input: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: "Confirm your e-mail address for Fadeline",
    text: `Hello ${oneLine(input.name)},\n\nConfirm your address to finish creating your Fadeline account: ${input.link}\n\nThe link works once, for 24 hours. If you did not sign up, ignore this mail.`,
    html: layout(
      "Confirm your e-mail address",
      [
        `Hello ${escapeHtml(oneLine(input.name))}, confirm your address to finish creating your Fadeline account.`,
        "The link works once, for 24 hours. If you did not sign up, ignore this mail.",
      ],
      { href: input.link, label: "Confirm my address" },
    ),
  };
}

export function accountExistsMail(input: { to: string; signInLink: string; resetLink: string }): OutgoingMail {
  return {
    to: input.to,
    subject: "Someone tried to create a Fadeline account with your address",
    text: `Someone (perhaps you) tried to create a Fadeline account with this address, but you already have one.\n\nSign in: ${input.signInLink}\nForgot your password? ${input.resetLink}\n\nIf it was not you, no action is needed; your account is unchanged.`,
    html: layout(
      "You already have an account",
      [
        "Someone (perhaps you) tried to create a Fadeline account with this address, but you already have one.",
        `Forgot your password? <a href="${escapeHtml(input.resetLink)}">Choose a new one</a>. If it was not you, no action is needed.`,
      ],
      { href: input.signInLink, label: "Sign in" },
    ),
  };
}

export function resetPasswordMail(input: { to: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: "Choose a new Fadeline password",
    text: `Choose a new password for your Fadeline account: ${input.link}\n\nThe link works once, for 1 hour. If you did not ask for it, ignore this mail; your password is unchanged.`,
    html: layout(
      "Choose a new password",
      ["The link works once, for 1 hour. If you did not ask for it, ignore this mail; your password is unchanged."],
      { href: input.link, label: "Choose a new password" },
    ),
  };
}
