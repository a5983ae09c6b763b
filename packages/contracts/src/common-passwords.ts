// Passwords long enough to pass the length rule yet among the first tried by
// anyone guessing: keyboard runs, repeated words and digit runs as they show up
// near the top of published breach lists (from memory), plus the demo password.
// Compared case-insensitively; kept short on purpose, it is a floor, not a filter.
const COMMON = [
  '123456789012',
  '1234567890123',
  '12345678901234',
  '123456789123',
  '123123123123',
  '111111111111',
  '000000000000',
  '098765432109',
  '1q2w3e4r5t6y',
  '1qaz2wsx3edc',
  'qwertyuiop12',
  'qwertyuiop123',
  'qwerty123456',
  'qwertyqwerty',
  'asdfghjkl123',
  'zxcvbnm12345',
  'abcdefghijkl',
  'abc123abc123',
  'password1234',
  'password12345',
  'password123456',
  'passwordpassword',
  'password!234',
  'p@ssw0rd1234',
  'p@ssword1234',
  'iloveyou1234',
  'letmein12345',
  'welcome12345',
  'welcome123456',
  'administrator',
  'administrator1',
  'changeme1234',
  'changemenow!',
  'trustno1trustno1',
  'football1234',
  'baseball1234',
  'sunshine1234',
  'princess1234',
  'monkey123456',
  'dragon123456',
  'superman1234',
  'starwars1234',
  'polecourt-demo',
  'polecourt123',
  'polecourt1234',
] as const;

const COMMON_SET: ReadonlySet<string> = new Set(COMMON);

/** True for a password on the common list, or one character repeated. */
export function isCommonPassword(password: string): boolean {
  const p = password.trim().toLowerCase();
  if (COMMON_SET.has(p)) return true;
  return p.length > 0 && p.split('').every((c) => c === p[0]);
}
