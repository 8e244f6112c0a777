import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { json, urlencoded } from 'express';
import type { ErrorBody } from './filters/all-exceptions.filter';

/** Largest JSON body the API reads. The biggest real body (a house with every option) is a few kB. */
export const JSON_BODY_LIMIT = '200kb';
/** Deepest nesting of arrays and objects a body may have; real bodies nest four levels at most. */
export const JSON_MAX_DEPTH = 32;

class BodyTooDeepError extends Error {
  readonly status = 400;
  readonly type = 'entity.too.deep';
}

/**
 * Depth of the JSON text's nesting, read from the raw bytes before anything parses it: the
 * brackets outside strings. A body nested thousands of levels deep used to reach the validators
 * and overflow the stack; now it is refused first. ASCII brackets and quotes never occur inside
 * a UTF-8 multi-byte sequence, so scanning bytes is exact.
 */
export function jsonDepthExceeds(bytes: Uint8Array, maxDepth: number): boolean {
  let depth = 0;
  let inString = false;
  for (let index = 0; index < bytes.length; index++) {
    const byte = bytes[index];
    if (inString) {
      if (byte === 0x5c)
        index++; // backslash: skip the escaped character
      else if (byte === 0x22) inString = false;
    } else if (byte === 0x22) inString = true;
    else if (byte === 0x5b || byte === 0x7b) {
      if (++depth > maxDepth) return true;
    } else if (byte === 0x5d || byte === 0x7d) depth--;
  }
  return false;
}

class BodyNotUnicodeError extends Error {
  readonly status = 400;
  readonly type = 'entity.not.unicode';
}

/**
 * True when every string (and key) of a parsed body is well-formed Unicode. JSON may spell out a
 * lone surrogate ("\ud800"); such text cannot be encoded, stored or compared reliably (e-mail
 * checks throw on it), so the body is refused as a whole.
 */
const LONE_SURROGATE = /\p{Surrogate}/u;
const wellFormed = (text: string) => !LONE_SURROGATE.test(text);

export function wellFormedText(value: unknown): boolean {
  if (typeof value === 'string') return wellFormed(value);
  if (Array.isArray(value)) return value.every(wellFormedText);
  if (value && typeof value === 'object') {
    return Object.entries(value).every(([key, inner]) => wellFormed(key) && wellFormedText(inner));
  }
  return true;
}

/** Keys that name an object's prototype machinery: no body of ours has them, and a merge could follow them. */
const PROTOTYPE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

/** The first prototype key anywhere in a parsed body (JSON.parse keeps "__proto__" as an own key), or null. */
export function prototypeKeyIn(value: unknown): string | null {
  if (Array.isArray(value)) {
    for (const item of value) {
      const found = prototypeKeyIn(item);
      if (found) return found;
    }
    return null;
  }
  if (value && typeof value === 'object') {
    for (const key of Object.keys(value)) {
      if (PROTOTYPE_KEYS.has(key)) return key;
      const found = prototypeKeyIn((value as Record<string, unknown>)[key]);
      if (found) return found;
    }
  }
  return null;
}

export class BodyPrototypeKeyError extends Error {
  readonly type = 'entity.prototype.key';
}

function bodyError(error: { status?: number; statusCode?: number; type?: string; message?: string }): ErrorBody {
  switch (error.type) {
    case 'entity.too.large':
      return {
        statusCode: 413,
        error: 'Payload Too Large',
        message: `The request body is larger than ${JSON_BODY_LIMIT.replace('kb', ' kB')}`,
      };
    case 'charset.unsupported':
    case 'encoding.unsupported':
      return {
        statusCode: 415,
        error: 'Unsupported Media Type',
        message: 'The request body must be JSON in UTF-8 (Content-Type: application/json; charset=utf-8)',
      };
    case 'entity.too.deep':
      return {
        statusCode: 400,
        error: 'Bad Request',
        message: `The request body nests arrays and objects more than ${JSON_MAX_DEPTH} levels deep`,
      };
    case 'entity.not.unicode':
      return {
        statusCode: 400,
        error: 'Bad Request',
        message: 'The request body holds text that is not valid Unicode (a lone surrogate)',
      };
    case 'entity.prototype.key':
      return {
        statusCode: 400,
        error: 'Bad Request',
        message: `The request body uses a field name that is not allowed (${error.message})`,
      };
    case 'entity.parse.failed':
      return { statusCode: 400, error: 'Bad Request', message: 'The request body is not valid JSON' };
    default:
      return { statusCode: 400, error: 'Bad Request', message: 'The request body could not be read' };
  }
}

/**
 * Runs a body parser and answers its errors itself, in the one error shape. Left to Express, a
 * parser error would travel on to the static-files handler of the built app, which answers
 * 404 "Cannot POST" for a malformed, oversized or wrongly encoded body.
 */
function answeringErrors(parser: RequestHandler, name: string): RequestHandler {
  const handler = (request: Request, response: Response, next: NextFunction) => {
    void parser(request, response, (parseError?: unknown) => {
      const prototypeKey = parseError ? null : prototypeKeyIn(request.body);
      const error =
        parseError ??
        (prototypeKey ? new BodyPrototypeKeyError(prototypeKey) : undefined) ??
        (wellFormedText(request.body) ? undefined : new BodyNotUnicodeError('not well-formed'));
      if (!error) return next();
      const body = bodyError(error as Parameters<typeof bodyError>[0]);
      // The rest of the body was not read: close the connection rather than read it on.
      if (body.statusCode === 413) response.setHeader('Connection', 'close');
      response.status(body.statusCode).json(body);
    });
  };
  // Named as Nest names its own parsers, so that Nest does not add them a second time.
  Object.defineProperty(handler, 'name', { value: name });
  return handler;
}

/** The JSON and form parsers of the API, with a size limit, a depth limit and their own error answers. */
export function bodyParsers(): RequestHandler[] {
  return [
    answeringErrors(
      json({
        limit: JSON_BODY_LIMIT,
        verify: (_request, _response, bytes) => {
          if (jsonDepthExceeds(bytes, JSON_MAX_DEPTH)) throw new BodyTooDeepError('too deep');
        },
      }),
      'jsonParser',
    ),
    answeringErrors(urlencoded({ extended: false, limit: JSON_BODY_LIMIT }), 'urlencodedParser'),
  ];
}
