/**
 * Password rules of NIST SP 800-63B (2017), §5.1.1.2 "Memorized Secret Verifiers": at least 8
 * characters, at least 64 allowed, any printable character and spaces, no composition rules,
 * and no password found in a list of commonly used or breached passwords, or made of the
 * account's own name or e-mail.
 */

export const PASSWORD_MIN_LENGTH = 8;
/** NIST asks for at least 64; we take more, so long passphrases fit. */
export const PASSWORD_MAX_LENGTH = 256;

export interface PasswordContext {
  /** Lower-case passwords known to be common (the server loads a published list). */
  commonPasswords?: ReadonlySet<string>;
  /** Words of the account itself: e-mail, display name. */
  accountWords?: string[];
}

/** Counts characters as a person sees them (code points), not UTF-16 units. */
function characterCount(value: string): number {
  return [...value].length;
}

/** Returns the problems, in plain words; an empty list means the password is acceptable. */
export function checkPassword(password: string, context: PasswordContext = {}): string[] {
  const problems: string[] = [];
  const length = characterCount(password);
  if (length < PASSWORD_MIN_LENGTH)
    problems.push(`Use at least ${PASSWORD_MIN_LENGTH} characters.`);
  if (length > PASSWORD_MAX_LENGTH) problems.push(`Use at most ${PASSWORD_MAX_LENGTH} characters.`);
  const normalised = password.normalize('NFKC').toLowerCase();
  if (context.commonPasswords?.has(normalised)) {
    problems.push('This password is on a list of commonly used passwords; choose another.');
  }
  if (accountDerivatives(context.accountWords ?? []).has(lettersAndDigits(normalised))) {
    problems.push('Do not use your name or e-mail address as the password.');
  }
  return problems;
}

function lettersAndDigits(value: string): string {
  return value.replace(/[^\p{L}\p{N}]/gu, '');
}

/**
 * The account's own words and what is commonly derived from them (NIST: "the username, and
 * derivatives thereof"): the whole value, an e-mail's local part, and each single word, all
 * compared without punctuation or spaces, so "lead.alderfalls", "LeadAlderfalls" and
 * "Marguerite Osei" all count.
 */
function accountDerivatives(accountWords: string[]): Set<string> {
  const derived = new Set<string>();
  for (const raw of accountWords) {
    const word = raw.normalize('NFKC').toLowerCase();
    const localPart = word.split('@')[0] ?? word;
    for (const candidate of [word, localPart, ...word.split(/[@.\s_-]+/)]) {
      const compact = lettersAndDigits(candidate);
      if (compact.length >= 4) derived.add(compact);
    }
  }
  return derived;
}
