import common from './common-passwords.json' with { type: 'json' };

const COMMON = new Set(common.passwords);

/** The service's own name and the demo password printed in the README are context words. */
const CONTEXT_WORDS = ['ligament', 'lantern-demo-2026', 'lantern-demo'];

/** Keyboard and alphabet runs: a password inside one of these (either way round) is no secret. */
const RUNS = [
  'abcdefghijklmnopqrstuvwxyz',
  '01234567890',
  'qwertyuiop',
  'asdfghjkl',
  'zxcvbnm',
  '1qaz2wsx3edc4rfv',
];

/**
 * Why a new password is refused, or null: the length (10 to 200) is checked by the DTO; this adds the
 * rules of NIST SP 800-63B 5.1.1.2 (from memory): not a commonly used password, not repetitive or
 * sequential, not the e-mail, name or service name.
 *
 * @param context words that belong to the account (e-mail, its local part, the name)
 * @example
 * passwordProblem('Password2026!', []); // 'is one of the most common passwords …'
 * passwordProblem('heron-gusset-plate-41', []); // null
 */
export function passwordProblem(password: string, context: readonly string[]): string | null {
  const lower = password.toLowerCase();
  // "Password2026!" is "password" with decoration: strip leading and trailing digits and symbols.
  const base = lower.replace(/^[^\p{L}]+|[^\p{L}]+$/gu, '');
  if (COMMON.has(lower) || (base.length >= 3 && COMMON.has(base)))
    return 'is one of the most common passwords (or one with digits or symbols added); choose another';
  if (new Set(lower).size < 5) return 'repeats too few different characters; choose another';
  const squeezed = lower.replace(/[^\p{L}\p{N}]/gu, '');
  if (RUNS.some((run) => run.includes(squeezed) || [...run].reverse().join('').includes(squeezed)))
    return 'is a run of keys or letters; choose another';
  const words = [...CONTEXT_WORDS, ...context]
    .map((w) => w.trim().toLowerCase())
    .filter((w) => w.length >= 4);
  if (words.some((w) => lower.includes(w) || (base.length >= 4 && w.includes(base))))
    return 'contains your e-mail, your name or the service name; choose another';
  return null;
}
