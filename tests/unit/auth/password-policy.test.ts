/**
 * Password rules checked against OWASP ASVS 5.0 §6.2 (6.2.1 minimum length, 6.2.4 common passwords,
 * 6.2.5 no composition rules, 6.2.8 verified exactly as typed, 6.2.9 long passwords allowed) and the OWASP
 * Password Storage Cheat Sheet (bcrypt work factor ≥ 10; its 72-byte input limit).
 */
import { describe, expect, it } from "vitest";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { isCommonPassword } from "@/lib/auth/common-passwords";
import { newPasswordSchema } from "@/lib/validation/auth";

const accepts = (p: string) => newPasswordSchema.safeParse(p).success;
const messageFor = (p: string) => newPasswordSchema.safeParse(p).error?.issues[0]?.message;

describe("password policy", () => {
  it("needs at least 12 characters and allows up to 128 (issue: ≥ 12 allowed up to 128; ASVS 6.2.1, 6.2.9)", () => {
    expect(messageFor("elevenchars")).toBe("Use at least 12 characters; a short phrase is easiest to remember.");
    expect(accepts("twelve chars")).toBe(true);
    expect(accepts("x".repeat(127) + "y")).toBe(true);
    expect(messageFor("x".repeat(129))).toBe("Use at most 128 characters.");
  });

  it("has no composition rules: lower case only, spaces, accents and emoji are fine (ASVS 6.2.5)", () => {
    expect(accepts("all lower case words here")).toBe(true);
    expect(accepts("crème brûlée à la plage")).toBe(true);
    expect(accepts("🚐🏔️🔥🚐🏔️🔥🚐🏔️🔥🚐🏔️🔥")).toBe(true);
  });

  it("refuses common passwords whatever their case and spacing (ASVS 6.2.4)", () => {
    for (const p of ["password1234", "Password 1234", "QWERTYUIOP123", "123456789012", "iloveyou1234"]) {
      expect(isCommonPassword(p)).toBe(true);
      expect(messageFor(p)).toBe("That password is on the list of the most common ones. Choose another.");
    }
    expect(isCommonPassword("gravel switchback at dusk")).toBe(false);
  });
});

describe("password hashing", () => {
  it("uses bcrypt with a work factor of at least 10 and a salt per hash (OWASP Password Storage Cheat Sheet)", async () => {
    const [a, b] = await Promise.all([hashPassword("same phrase twice"), hashPassword("same phrase twice")]);
    const cost = Number(a.split("$")[2]);
    expect(a).toMatch(/^\$2[aby]\$\d\d\$/);
    expect(cost).toBeGreaterThanOrEqual(10);
    expect(a).not.toBe(b);
    expect(await verifyPassword("same phrase twice", a)).toBe(true);
    expect(await verifyPassword("same phrase twice ", a)).toBe(false); // verified exactly as typed (ASVS 6.2.8)
  });

  it("every character counts, past bcrypt's 72-byte limit (docs/security.md B10)", async () => {
    const hash = await hashPassword("a".repeat(72) + "X");
    expect(await verifyPassword("a".repeat(72) + "Y", hash)).toBe(false);
    const emoji = "🔥".repeat(64); // 64 characters, 256 bytes of UTF-8
    const emojiHash = await hashPassword(emoji);
    expect(await verifyPassword("🔥".repeat(63) + "🚐", emojiHash)).toBe(false);
    expect(await verifyPassword(emoji, emojiHash)).toBe(true);
  });
});
