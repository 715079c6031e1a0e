/** Mail bodies escape what users typed (HTML5 character references) and subjects stay one line (RFC 5322 §2.2). */
import { expect, it } from "vitest";
import { escapeHtml, invitationMail } from "@/lib/server/mail-templates";

it("escapes the five HTML-significant characters", () => {
  expect(escapeHtml(`<a href="x">'&'</a>`)).toBe("&#60;a href=&#34;x&#34;&#62;&#39;&#38;&#39;&#60;/a&#62;");
});

it("puts a link, the role and the expiry in an invitation and keeps user text inert", () => {
  const mail = invitationMail({
    to: "p@test.example",
    organisationName: "Gorge <img src=x onerror=alert(1)>\r\nBcc: q@test.example",
    inviterName: "Olive",
    role: "planner",
    link: "http://127.0.0.1:3000/invite?token=abc",
    expiresAt: new Date("2026-12-08T10:00:00Z"),
  });
  expect(mail.subject).not.toMatch(/[\r\n]/);
  expect(mail.html).not.toContain("<img");
  expect(mail.text).toContain("as a planner");
  expect(mail.text).toContain("http://127.0.0.1:3000/invite?token=abc");
  expect(mail.text).toContain("Tue, 08 Dec 2026 10:00:00 GMT");
});
