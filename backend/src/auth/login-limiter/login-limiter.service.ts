import { HttpException, HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Environment } from '../../config/environment';
import { normaliseEmail } from '../../users/users.service';
import type { LoginAttemptStore } from './login-attempt-store';

export const LOGIN_ATTEMPT_STORE = Symbol('LOGIN_ATTEMPT_STORE');

/** The limiter's window: the limits are "per minute". */
export const LOGIN_WINDOW_MS = 60_000;

/** 429 in the one error shape, with Retry-After set by the controller. */
export class TooManyAttemptsException extends HttpException {
  constructor(message: string) {
    super(message, HttpStatus.TOO_MANY_REQUESTS);
  }
}

/**
 * The other routes a stranger could hammer, each counted under keys of its own (using up one does
 * not use up sign-in): a password change (knowing the current one), a reset request (it sends
 * mail), setting a password with a reset link, and signing up through an invitation link.
 */
export type GuardedAction = 'password-change' | 'password-reset-request' | 'password-reset' | 'invitation-sign-up';

/**
 * Sign-in and register limits, and those of the guarded actions above, counted in a pluggable
 * store (memory for one instance, the database when several instances share one):
 * - per client address (LOGIN_RATE_LIMIT_PER_MINUTE): every sign-in and register attempt, and
 *   every guarded action, each action on its own count;
 * - per account (LOGIN_RATE_LIMIT_PER_ACCOUNT_PER_MINUTE): sign-in attempts on one e-mail from
 *   any address, cleared by a successful sign-in. It stops one account being guessed at from
 *   many addresses, while an address that has used up its own allowance leaves the account's
 *   owner free to sign in from elsewhere. Unknown e-mails are counted like known ones, so the
 *   limiter tells nobody which accounts exist. Password changes and reset requests are counted
 *   per account too (a reset request by the address it would mail, so that nobody can flood an
 *   inbox from many addresses).
 * An attempt refused by a limit is not recorded, so hammering a closed door does not keep it shut.
 */
@Injectable()
export class LoginLimiterService {
  private readonly perAddress: number;
  private readonly perAccount: number;

  constructor(
    @Inject(LOGIN_ATTEMPT_STORE) private readonly store: LoginAttemptStore,
    config: ConfigService<Environment, true>,
  ) {
    this.perAddress = config.get('LOGIN_RATE_LIMIT_PER_MINUTE', { infer: true });
    this.perAccount = config.get('LOGIN_RATE_LIMIT_PER_ACCOUNT_PER_MINUTE', { infer: true });
  }

  /** Before a sign-in (with its e-mail) or a registration (without): refuses with 429 over a limit. */
  async admit(address: string, email?: string, now = new Date()): Promise<void> {
    await this.take(`address:${address}`, this.perAddress, now, 'Too many attempts from this address');
    if (email !== undefined) {
      await this.take(`account:${normaliseEmail(email)}`, this.perAccount, now, 'Too many attempts on this account');
    }
  }

  /**
   * Before a guarded action from `address`, with the account's e-mail where the action has one:
   * refuses with 429 over a limit.
   */
  async admitAction(action: GuardedAction, address: string, email?: string, now = new Date()): Promise<void> {
    await this.take(`${action}:address:${address}`, this.perAddress, now, 'Too many attempts from this address');
    if (email !== undefined) {
      await this.take(
        `${action}:account:${normaliseEmail(email)}`,
        this.perAccount,
        now,
        'Too many attempts on this account',
      );
    }
  }

  /** After a successful sign-in: the account's count starts again. */
  async succeeded(email: string): Promise<void> {
    await this.store.clear(`account:${normaliseEmail(email)}`);
  }

  private async take(key: string, limit: number, now: Date, what: string): Promise<void> {
    const refuse = () => new TooManyAttemptsException(`${what}; wait a minute and try again`);
    if ((await this.store.count(key, now)) >= limit) throw refuse();
    if ((await this.store.record(key, now)) > limit) throw refuse();
  }
}
