import { checkPassword, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from './password-policy';

/** A stand-in for the published list the server loads; the checker expects lower-case entries. */
const COMMON = new Set(['password123', 'letmein1', 'sunshine']);

const TOO_SHORT = 'Use at least 8 characters.';
const COMMON_MESSAGE = 'This password is on a list of commonly used passwords; choose another.';
const ACCOUNT_MESSAGE = 'Do not use your name or e-mail address as the password.';

describe('password policy (NIST SP 800-63B, 2017, §5.1.1.2)', () => {
  it('refuses 7 characters and accepts 8', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: memorized secrets SHALL be at least 8 characters.
    expect(PASSWORD_MIN_LENGTH).toBe(8);
    expect(checkPassword('tealyrn')).toEqual([TOO_SHORT]);
    expect(checkPassword('tealyarn')).toEqual([]);
  });

  it('accepts 64 characters', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: verifiers SHOULD permit at least 64 characters.
    const sixtyFour = 'loom'.repeat(16);
    expect([...sixtyFour]).toHaveLength(64);
    expect(checkPassword(sixtyFour)).toEqual([]);
    expect(PASSWORD_MAX_LENGTH).toBeGreaterThanOrEqual(64);
  });

  it('refuses a password longer than the ceiling, naming the ceiling', () => {
    expect(checkPassword('a'.repeat(PASSWORD_MAX_LENGTH + 1))).toEqual([
      `Use at most ${PASSWORD_MAX_LENGTH} characters.`,
    ]);
    expect(checkPassword('a'.repeat(PASSWORD_MAX_LENGTH))).toEqual([]);
  });

  it('allows spaces, inside and at the ends', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: all printing ASCII characters and the space
    // character SHOULD be acceptable.
    expect(checkPassword('quiet teal yarn by the winter window')).toEqual([]);
    expect(checkPassword(' cast on ')).toEqual([]);
  });

  it('imposes no composition rules: all lower-case letters are accepted', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: verifiers SHOULD NOT impose other composition
    // rules (e.g. requiring mixtures of different character types).
    expect(checkPassword('mossgreenbobbin')).toEqual([]);
    expect(checkPassword('12345678909876')).toEqual([]);
  });

  it('refuses a password from the common set, whatever its case', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: compare against a list of commonly used,
    // expected or compromised values.
    for (const candidate of ['password123', 'PASSWORD123', 'PassWord123', 'SunShine']) {
      expect({
        candidate,
        problems: checkPassword(candidate, { commonPasswords: COMMON }),
      }).toEqual({ candidate, problems: [COMMON_MESSAGE] });
    }
    expect(checkPassword('password124x', { commonPasswords: COMMON })).toEqual([]);
  });

  it("refuses the account's e-mail local part", () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: context-specific words such as the username and
    // derivatives thereof.
    const accountWords = ['mossgreenknitter@emberfold.example', 'Marguerite Osei'];
    expect(checkPassword('mossgreenknitter', { accountWords })).toEqual([ACCOUNT_MESSAGE]);
    expect(checkPassword('MossGreenKnitter', { accountWords })).toEqual([ACCOUNT_MESSAGE]);
    expect(checkPassword('mossgreenknitter2', { accountWords })).toEqual([]);
  });

  it('refuses a dotted e-mail local part, and the whole e-mail address', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2, as above; addresses like "first.last@…" are the
    // usual shape, and the whole address is the most obvious derivative of the username.
    const accountWords = ['lead.alderfalls@emberfold.example'];
    expect(checkPassword('lead.alderfalls', { accountWords })).toEqual([ACCOUNT_MESSAGE]);
    expect(checkPassword('lead.alderfalls@emberfold.example', { accountWords })).toEqual([
      ACCOUNT_MESSAGE,
    ]);
  });

  it('counts characters as code points: an emoji counts as one', () => {
    // Source: NIST SP 800-63B (2017) §5.1.1.2: each Unicode code point SHALL be counted as a
    // single character.
    const sevenWithEmoji = 'tealyr\u{1F9F6}'; // 7 code points, 8 UTF-16 units
    expect(sevenWithEmoji).toHaveLength(8);
    expect(checkPassword(sevenWithEmoji)).toEqual([TOO_SHORT]);
    expect(checkPassword('tealyrn\u{1F9F6}')).toEqual([]);
  });
});
