import { passwordProblem } from './password-policy';

describe('passwordProblem', () => {
  it('refuses passwords shorter than ten characters', () => {
    expect(passwordProblem('short-pw1')).toMatch(/at least 10/);
  });

  it('refuses a password on the common-password list', () => {
    // "1234567890" and "qwertyuiop" are on Mozilla's list (fxa-common-password-list).
    expect(passwordProblem('1234567890')).toMatch(/common passwords/);
    expect(passwordProblem('qwertyuiop')).toMatch(/common passwords/);
  });

  it('refuses a password made from the e-mail address', () => {
    expect(passwordProblem('janedoe2026', 'janedoe@example.test')).toMatch(/e-mail/);
  });

  it('refuses more than bcrypt can read', () => {
    expect(passwordProblem('é'.repeat(40))).toMatch(/at most 72 bytes/);
  });

  it('accepts a long, uncommon password', () => {
    expect(passwordProblem('brass-teal-hone-2291')).toBeNull();
  });
});
