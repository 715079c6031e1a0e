/**
 * Input schemas at the API boundary. E-mail addresses: the addr-spec forms zod accepts (quoted local parts
 * and header-breaking characters refused, as docs/security.md B14 and D14 ask); names never carry line breaks
 * (mail headers, RFC 5322 §2.2: a header field is one line unless folded).
 */
import { describe, expect, it } from "vitest";
import { emailSchema, signUpSchema } from "@/lib/validation/auth";
import { acceptInvitationSchema, invitationInputSchema } from "@/lib/validation/organisation";

describe("e-mail addresses", () => {
  it("are trimmed and lower-cased", () => {
    expect(emailSchema.parse("  Olive.Marsh@Example.COM ")).toBe("olive.marsh@example.com");
  });
  it.each(['"x@attacker.example"@victim.example', "a@b", "no-at-sign", "a@b.example\r\nBcc: c@d.example", "", "a".repeat(250) + "@x.example"])(
    "refuses %j",
    (value) => {
      expect(emailSchema.safeParse(value).success).toBe(false);
    },
  );
});

describe("request shapes", () => {
  it("refuse extra fields, such as a role smuggled into sign-up", () => {
    const result = signUpSchema.safeParse({ name: "A", email: "a@b.example", password: "long enough phrase", role: "owner" });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]).toMatchObject({ code: "unrecognized_keys", keys: ["role"] });
  });
  it("refuse a role on accepting an invitation (the role comes from the invitation)", () => {
    expect(acceptInvitationSchema.safeParse({ token: "A".repeat(43), role: "owner" }).success).toBe(false);
  });
  it("name each missing field", () => {
    const result = signUpSchema.safeParse({});
    expect(result.error?.issues.map((i) => i.path.join("."))).toEqual(["name", "email", "password"]);
  });
  it("know only the three roles", () => {
    expect(invitationInputSchema.safeParse({ email: "a@b.example", role: "admin" }).error?.issues[0]?.message).toBe(
      "Choose owner, planner or viewer.",
    );
  });
  it("refuse names with line breaks", () => {
    expect(signUpSchema.safeParse({ name: "Eve\r\nBcc: x@y.example", email: "a@b.example", password: "long enough phrase" }).success).toBe(false);
  });
});
