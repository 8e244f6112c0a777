import type { Request, Response } from 'express';
import { LOGIN_WINDOW_MS, TooManyAttemptsException } from './login-limiter.service';

/** Runs `work`; a limiter refusal also tells the client when to try again. */
export async function withRetryAfter<T>(response: Response, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof TooManyAttemptsException) response.setHeader('Retry-After', String(LOGIN_WINDOW_MS / 1000));
    throw error;
  }
}

/** The client's address: behind a reverse proxy, as TRUST_PROXY lets Express read it. */
export function clientAddress(request: Request): string {
  return request.ip ?? request.socket.remoteAddress ?? 'unknown';
}
