import { createHash } from 'node:crypto';
import { Op } from 'sequelize';
import type { LoginAttempt } from './login-attempt.model';

/**
 * Where the sign-in limiter counts attempts: a sliding window of `windowMs` per key. Both stores
 * behave the same; the database one is shared by every API instance on the database.
 */
export interface LoginAttemptStore {
  /** Attempts under `key` in the window ending at `now`. */
  count(key: string, now: Date): Promise<number>;
  /** Records one attempt at `now`; returns the attempts in the window, this one included. */
  record(key: string, now: Date): Promise<number>;
  /** Forgets every attempt under `key`. */
  clear(key: string): Promise<void>;
}

/** Keys are stored hashed: no address or e-mail in clear, and always 64 characters. */
export function hashKey(key: string): string {
  return createHash('sha256').update(key).digest('hex');
}

/** Attempts kept in this process's memory: right for one instance, lost on restart. */
export class MemoryLoginAttemptStore implements LoginAttemptStore {
  private readonly attempts = new Map<string, number[]>();
  private lastSweep = 0;

  constructor(private readonly windowMs: number) {}

  async count(key: string, now: Date): Promise<number> {
    return this.recent(hashKey(key), now.getTime()).length;
  }

  async record(key: string, now: Date): Promise<number> {
    const hashed = hashKey(key);
    const times = this.recent(hashed, now.getTime());
    times.push(now.getTime());
    this.attempts.set(hashed, times);
    this.sweep(now.getTime());
    return times.length;
  }

  async clear(key: string): Promise<void> {
    this.attempts.delete(hashKey(key));
  }

  /** How many keys are held (for tests: old keys are swept away). */
  get size(): number {
    return this.attempts.size;
  }

  private recent(hashed: string, now: number): number[] {
    const since = now - this.windowMs;
    return (this.attempts.get(hashed) ?? []).filter((t) => t > since && t <= now);
  }

  /** Drops keys with no attempt left in the window, at most once per window. */
  private sweep(now: number): void {
    if (now - this.lastSweep < this.windowMs) return;
    this.lastSweep = now;
    const since = now - this.windowMs;
    for (const [key, times] of this.attempts) {
      if (times.every((t) => t <= since)) this.attempts.delete(key);
    }
  }
}

/**
 * Attempts kept in the `login_attempts` table. Recording inserts a row and then counts the rows
 * in the window, so concurrent attempts on several instances each see every attempt committed
 * before theirs: the limit cannot be overshot by racing requests.
 */
export class DatabaseLoginAttemptStore implements LoginAttemptStore {
  private lastSweep = 0;

  constructor(
    private readonly model: typeof LoginAttempt,
    private readonly windowMs: number,
  ) {}

  count(key: string, now: Date): Promise<number> {
    return this.model.count({
      where: { key: hashKey(key), at: { [Op.gt]: new Date(now.getTime() - this.windowMs), [Op.lte]: now } },
    });
  }

  async record(key: string, now: Date): Promise<number> {
    await this.model.create({ key: hashKey(key), at: now });
    await this.sweep(now);
    return this.count(key, now);
  }

  async clear(key: string): Promise<void> {
    await this.model.destroy({ where: { key: hashKey(key) } });
  }

  /** Deletes attempts older than the window, at most once per window per instance. */
  private async sweep(now: Date): Promise<void> {
    if (now.getTime() - this.lastSweep < this.windowMs) return;
    this.lastSweep = now.getTime();
    await this.model.destroy({ where: { at: { [Op.lte]: new Date(now.getTime() - this.windowMs) } } });
  }
}
