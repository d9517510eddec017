import { commonPasswordWords, longCommonPasswords } from '../catalogue/common-passwords';

/**
 * Password rules shared by the server and the forms. They follow NIST SP 800-63B §5.1.1.2 (memorised
 * secrets): a minimum length, and a check against commonly used passwords, dictionary words, repetitive or
 * sequential characters and context-specific words — no composition rules (no "one capital, one digit").
 */
export const PASSWORD_MIN_LENGTH = 12;
const PASSWORD_MAX_LENGTH = 200;

const listed = new Set(longCommonPasswords);
const words = new Set(commonPasswordWords);

/** Keyboard rows and columns (QWERTY, AZERTY, QWERTZ) and plain sequences; read in both directions. */
const runs = [
  '`1234567890-=',
  'qwertyuiop[]',
  "asdfghjkl;'",
  'zxcvbnm,./',
  'azertyuiop',
  'qsdfghjklm',
  'wxcvbn',
  'qwertzuiop',
  'yxcvbnm',
  '1qaz2wsx3edc4rfv5tgb6yhn7ujm8ik,9ol.0p;/',
  'zaq12wsxcde34rfvbgt56yhnmju78ik,9ol.0p;/',
  'q1w2e3r4t5y6u7i8o9p0',
  '1q2w3e4r5t6y7u8i9o0p',
  'qazwsxedcrfvtgbyhnujmikolp',
  'qweasdzxc',
  'qwerasdfzxcv',
  'abcdefghijklmnopqrstuvwxyz',
  '0123456789012345678901234567890',
  '11223344556677889900',
].flatMap((r) => [r, [...r].reverse().join('')]);

const LEET: Record<string, string> = {
  '0': 'o',
  '3': 'e',
  '4': 'a',
  '5': 's',
  '7': 't',
  '8': 'b',
  '9': 'g',
  '@': 'a',
  $: 's',
  '!': 'i',
  '|': 'l',
};

function deLeet(s: string): string[] {
  const base = [...s].map((c) => LEET[c] ?? c).join('');
  return base.includes('1') ? [base.replaceAll('1', 'i'), base.replaceAll('1', 'l')] : [base];
}

const isFiller = (c: string) => !/\p{L}/u.test(c);
const isRun = (s: string) => s.length >= 3 && runs.some((r) => r.includes(s));
const isWord = (s: string, extra: Set<string>) =>
  s.length >= 3 && [s, ...deLeet(s)].some((w) => words.has(w) || extra.has(w));

/**
 * True when the password is nothing but keyboard runs, sequences, digits and symbols, plus at most one
 * common word (or context word): "Sunshine2024!", "qwerty123456", "p@ssw0rd-1234", "1qaz2wsx3edc".
 * Dynamic programming over the positions; state = position × whether the one word has been used.
 */
function onlyPredictableParts(pw: string, extra: Set<string>): boolean {
  const n = pw.length;
  // reach[i][w][m]: prefix of length i is covered, w = a word was used, m = a run or word was used.
  const reach = Array.from({ length: n + 1 }, () => [
    [false, false],
    [false, false],
  ]);
  reach[0][0][0] = true;
  for (let i = 0; i < n; i++) {
    const spans: { j: number; run: boolean; word: boolean }[] = [];
    if (reach[i].some((row) => row.some(Boolean))) {
      for (let j = i + 3; j <= Math.min(n, i + 40); j++) {
        const part = pw.slice(i, j);
        spans.push({ j, run: isRun(part), word: j - i <= 24 && isWord(part, extra) });
      }
    }
    for (const w of [0, 1]) {
      for (const m of [0, 1]) {
        if (!reach[i][w][m]) continue;
        if (isFiller(pw[i])) reach[i + 1][w][m] = true;
        for (const { j, run, word } of spans) {
          if (run) reach[j][w][1] = true;
          if (word && w === 0) reach[j][1][1] = true;
        }
      }
    }
  }
  return reach[n][0][1] || reach[n][1][1];
}

function repetitive(pw: string): boolean {
  if (new Set(pw).size < 5) return true;
  for (let unit = 1; unit <= pw.length / 2; unit++) {
    if (pw.length % unit === 0 && pw.slice(0, unit).repeat(pw.length / unit) === pw) return true;
  }
  return false;
}

/** Words a password must not be built on besides the common ones: the app's name, the person's name and e-mail. */
function contextWords(context: { email?: string; name?: string }): Set<string> {
  const out = new Set(['rfolio']);
  const local = context.email?.split('@')[0]?.toLowerCase() ?? '';
  for (const part of [local, ...local.split(/[._+-]/), ...(context.name?.toLowerCase().split(/\s+/) ?? [])]) {
    if (part.length >= 3) out.add(part);
  }
  return out;
}

/**
 * Why a new password is refused, or null when it is acceptable.
 * @param context the account's e-mail and name, when known, so they are not used as the password's base.
 */
export function passwordProblem(password: string, context: { email?: string; name?: string } = {}): string | null {
  if (password.length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (password.length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
  const lower = password.toLowerCase();
  if (listed.has(lower)) return 'This is one of the most common passwords. Choose another.';
  if (repetitive(lower)) return 'Too repetitive. Try a few unrelated words.';
  const extra = contextWords(context);
  if (onlyPredictableParts(lower, extra)) {
    return 'Too predictable: a common word, name, keyboard run or sequence padded with digits or symbols. Try a few unrelated words.';
  }
  return null;
}
