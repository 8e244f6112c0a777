import { applyDecorators, BadRequestException, ConflictException, HttpException, HttpStatus } from '@nestjs/common';
import { ApiConflictResponse, ApiHeader, ApiResponse } from '@nestjs/swagger';

/**
 * Optimistic concurrency for stored things people edit (houses, farms, climates, calendars, fuel
 * prices). Each carries a `version` that every successful write raises by one. A write names the
 * version it was based on in the `If-Match` header (`If-Match: 3`; `"3"` and `W/"3"` are read the
 * same); a singleton that has never been saved (a climate, a calendar) reads as version 0.
 *
 * - no If-Match: 428 Precondition Required;
 * - a version other than the stored one: 409 Conflict with `current`, the stored state, unless the
 *   write would change nothing (then it answers 200 with the stored state: nothing is lost).
 */
export const IF_MATCH_HEADER = 'if-match';

/** 409: somebody else saved first. `current` is what is stored now (the GET body). */
export class StaleWriteException extends ConflictException {
  constructor(public readonly current: unknown) {
    super('Changed by someone else since you loaded it; reload their version or overwrite it with yours');
  }
}

export class PreconditionRequiredException extends HttpException {
  constructor() {
    super(
      { message: 'Send If-Match: <version> with the version you loaded', field: 'If-Match' },
      HttpStatus.PRECONDITION_REQUIRED,
    );
  }
}

/** The version named by an If-Match header; 428 when it is missing, 400 when it is not a version. */
export function expectedVersion(header: string | string[] | undefined): number {
  const raw = Array.isArray(header) ? header[0] : header;
  if (raw === undefined || raw.trim() === '') throw new PreconditionRequiredException();
  const match = /^\s*(?:W\/)?"?(\d{1,9})"?\s*$/.exec(raw);
  if (!match) {
    throw new BadRequestException({
      message: 'If-Match must be the version you loaded, a whole number such as 3',
      field: 'If-Match',
    });
  }
  return Number(match[1]);
}

/** Throws 409 with the stored state when `expected` is not the stored version. */
export function assertVersion(storedVersion: number, expected: number, current: () => unknown): void {
  if (storedVersion !== expected) throw new StaleWriteException(current());
}

/** JSON with object keys sorted, so two equal values compare equal whatever their key order. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b)))
      : v,
  );
}

/** True when every field the write sets already holds that value (undefined fields are not set). */
export function changesNothing(current: Record<string, unknown>, changes: Record<string, unknown>): boolean {
  return Object.entries(changes).every(
    ([key, value]) => value === undefined || canonical(value ?? null) === canonical(current[key] ?? null),
  );
}

/**
 * OpenAPI: the If-Match header and the 409 / 428 answers of a versioned write. The header is
 * named exactly as the handler's `@Headers(IF_MATCH_HEADER)` reads it, so the document lists it
 * once (with this description) rather than once per spelling.
 */
export function ApiVersionedWrite(what: string) {
  return applyDecorators(
    ApiHeader({
      name: IF_MATCH_HEADER,
      required: true,
      description: `the \`version\` of the ${what} you loaded (0 if it has never been saved); every save raises it by one`,
      schema: { type: 'string', example: '3' },
    }),
    ApiConflictResponse({
      description: `someone else saved the ${what} first; \`current\` holds what is stored now (the same shape as the answer to GET)`,
    }),
    ApiResponse({ status: 428, description: 'If-Match missing' }),
  );
}
