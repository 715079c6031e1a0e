/**
 * Passwords of 12 or more characters that appear near the top of publicly reported most-common and breached
 * password lists (compiled from memory of those published rankings; not a copy of any one list). Shorter ones
 * are already refused by the length rule. Checked after lower-casing and removing spaces, so
 * "Password 1234" matches "password1234". A production deploy should add a breached-password check.
 */
export const COMMON_PASSWORDS: ReadonlySet<string> = new Set([
  "123456789012", "1234567890123", "12345678901234", "123456789123", "1234567890qwerty", "123123123123",
  "111111111111", "000000000000", "222222222222", "123412341234", "121212121212", "987654321012",
  "098765432112", "112233445566", "147258369147", "159753159753", "abcdefghijkl", "abcd1234abcd",
  "abc123abc123", "abcabcabcabc", "aaaaaaaaaaaa", "qwertyuiopas", "qwertyuiop12", "qwertyuiop123",
  "qwerty123456", "qwertyqwerty", "1qaz2wsx3edc", "1q2w3e4r5t6y", "q1w2e3r4t5y6", "zaq12wsxcde3",
  "asdfghjkl123", "asdfasdfasdf", "zxcvbnm12345", "zxcvbnmasdfg", "passwordpassword", "password1234",
  "password12345", "password123456", "password1234567", "password!123", "password2020", "password2021",
  "password2022", "password2023", "password2024", "password2025", "password2026", "passw0rd1234",
  "p@ssw0rd1234", "p@ssword1234", "mypassword123", "mypassword1234", "thisismypassword", "changeme1234",
  "changemenow1", "letmein12345", "letmeinnow123", "welcome12345", "welcome123456", "welcometo2024",
  "iloveyou1234", "iloveyou12345", "iloveyouforever", "iloveyoubaby", "football1234", "football12345",
  "baseball1234", "basketball12", "basketball123", "superman1234", "batman123456", "starwars1234",
  "pokemon12345", "princess1234", "sunshine1234", "monkey123456", "dragon123456", "master123456",
  "shadow123456", "michael12345", "jennifer1234", "jordan232323", "trustno11234", "administrator",
  "administrator1", "admin1234567", "admin123456789", "adminadmin123", "rootroot1234", "default12345",
  "secret123456", "nopassword12", "1234qwerasdf", "qwer1234asdf", "asdf1234qwer", "1q2w3e4r5t6y7u",
  "1qazxsw23edc", "!qaz2wsx#edc", "q1w2e3r4t5y6u7", "computer1234", "internet1234", "samsung12345",
  "whatever1234", "fuckyou12345", "loveyou12345", "qazwsxedcrfv", "qazwsxedc123", "lovelovelove",
  "hellohello12", "helloworld12", "helloworld123", "hello1234567", "goodluck1234", "freedom12345",
  "summer123456", "winter123456", "autumn123456", "spring123456", "december1234", "november1234",
  "september123", "october12345", "caravan12345", "caravanning1", "towing123456", "fadeline1234",
  "fadelinepassword",
]);

/** Whether a password is on the shipped common list (case and spaces ignored). */
export function isCommonPassword(password: string): boolean {
  return COMMON_PASSWORDS.has(password.toLowerCase().replace(/\s+/g, ""));
}
