import { BadRequestException, Injectable } from '@nestjs/common';
import { dictionary } from '@zxcvbn-ts/language-common';
import { checkPassword } from '@tallyloom/core';

/** Published list of common passwords (zxcvbn-ts, ~49,000 entries), loaded once. */
const COMMON_PASSWORDS: ReadonlySet<string> = new Set(
  dictionary.passwords.map((password) => password.toLowerCase()),
);

@Injectable()
export class PasswordPolicyService {
  /** Throws 400 naming `field` when the password breaks the NIST SP 800-63B rules. */
  assertAcceptable(password: string, field: string, accountWords: string[]): void {
    const problems = checkPassword(password, { commonPasswords: COMMON_PASSWORDS, accountWords });
    if (problems.length > 0) {
      throw new BadRequestException({
        message: `Invalid input: ${field}`,
        fields: [{ field, messages: problems }],
      });
    }
  }
}
