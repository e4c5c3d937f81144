import * as bcrypt from 'bcryptjs';
import { BCRYPT_COST, hashPassword, verifyPassword } from './password-hasher';

describe('password hasher', () => {
  it('uses bcrypt at cost 10 or more', async () => {
    const hash = await hashPassword('correct horse battery staple');
    expect(hash).toMatch(/^\$2[aby]\$\d\d\$/);
    expect(bcrypt.getRounds(hash)).toBeGreaterThanOrEqual(10);
    expect(BCRYPT_COST).toBeGreaterThanOrEqual(10);
  });

  it('accepts the right password and refuses a wrong one', async () => {
    const hash = await hashPassword('knit one, purl two');
    await expect(verifyPassword('knit one, purl two', hash)).resolves.toBe(true);
    await expect(verifyPassword('knit one, purl three', hash)).resolves.toBe(false);
  });

  it('tells apart long passphrases that differ only after 72 bytes', async () => {
    // Plain bcrypt ignores everything after byte 72; these two would collide without the pre-hash.
    const base = 'a'.repeat(80);
    const hash = await hashPassword(`${base}1`);
    await expect(verifyPassword(`${base}2`, hash)).resolves.toBe(false);
    await expect(verifyPassword(`${base}1`, hash)).resolves.toBe(true);
  });
});
