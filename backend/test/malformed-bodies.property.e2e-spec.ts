import fc from 'fast-check';
import openApiDocument from '../openapi.json';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

/**
 * Property: for every JSON write and estimate route the OpenAPI document lists, a malformed body
 * (wrong types, nulls, deep nesting, long strings and lists, unknown and prototype keys) sent by
 * a signed-in owner never answers 5xx; a 4xx answers in the one error shape; and no answer carries
 * NaN or Infinity. Seeded: set FUZZ_SEED to replay a run; the seed is printed on failure.
 */
const RUNS_PER_ROUTE = Number(process.env.FUZZ_RUNS ?? 100);
// A fixed seed, so that every run (and CI) checks the same bodies; FUZZ_SEED replays or widens it.
const SEED = Number(process.env.FUZZ_SEED ?? 20_261_202);

interface Route {
  method: 'post' | 'put' | 'patch';
  path: string;
  fields: string[];
}

type Schema = { $ref?: string; properties?: Record<string, Schema>; allOf?: Schema[] };

/** A JSON value written out by hand, so that keys such as __proto__ survive as plain keys. */
type Json = null | boolean | number | string | Json[] | { entries: Array<[string, Json]> };

function toText(value: Json): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map(toText).join(',')}]`;
  return `{${value.entries.map(([key, inner]) => `${JSON.stringify(key)}:${toText(inner)}`).join(',')}}`;
}

const nest = (depth: number, leaf: Json): Json =>
  depth === 0 ? leaf : depth % 2 ? [nest(depth - 1, leaf)] : { entries: [['a', nest(depth - 1, leaf)]] };

/** Values no field expects, or expects only in a narrower form. */
const hostileValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.constantFrom(0, -0, -1, 1e308, -1e308, 5e-324, 2 ** 53 + 1, 0.1, 1e21, 1.2345678901234567e19),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom('', ' ', 'NaN', 'Infinity', '-Infinity', '1e999', '0x1', '２', '2027-13-45', '\u0000', '\uD800'),
  fc.string({ maxLength: 20 }),
  fc.integer({ min: 1_000, max: 20_000 }).map((length) => 'x'.repeat(length)),
  fc.constant([] as Json[]),
  fc.constant([[]] as Json),
  fc.integer({ min: 200, max: 2_000 }).map((length) => Array.from({ length }, () => 1) as Json),
  fc.integer({ min: 20, max: 40 }).map((depth) => nest(depth, 1)),
  fc.constant({ entries: [] } as Json),
  fc.constant({ entries: [['__proto__', { entries: [['polluted', true]] }]] } as Json),
  fc.constant({ entries: [['constructor', { entries: [['prototype', { entries: [['polluted', true]] }]] }]] } as Json),
);

/** A body: known fields (from the schema) and odd keys, each with a hostile value — or not an object at all. */
function hostileBody(fields: string[]): fc.Arbitrary<Json> {
  const key = fc.oneof(
    { weight: 5, arbitrary: fields.length > 0 ? fc.constantFrom(...fields) : fc.constant('name') },
    { weight: 1, arbitrary: fc.constantFrom('__proto__', 'constructor', 'prototype', 'toString', 'unknownField', '') },
  );
  const object = fc
    .array(fc.tuple(key, hostileValue), { maxLength: 6 })
    .map((entries): Json => ({ entries: entries as Array<[string, Json]> }));
  return fc.oneof({ weight: 8, arbitrary: object }, { weight: 1, arbitrary: hostileValue });
}

/**
 * Every string and number in an answer, to look for NaN and Infinity written by the server. A
 * string the request itself sent (a house named "NaN") is the user's text, echoed, not a result.
 */
function findNonFinite(value: unknown, sent: ReadonlySet<string>, path = '$'): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : path;
  if (typeof value === 'string') return /\bNaN\b|Infinity/.test(value) && !sent.has(value) ? path : null;
  if (value && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) {
      const found = findNonFinite(inner, sent, `${path}.${key}`);
      if (found) return found;
    }
  }
  return null;
}

/** Every string in a generated body (values and keys), trimmed as the API may store them. */
function stringsIn(value: unknown, found = new Set<string>()): Set<string> {
  if (typeof value === 'string') {
    found.add(value);
    found.add(value.trim());
  } else if (value && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) {
      found.add(key);
      stringsIn(inner, found);
    }
  }
  return found;
}

/** The routes the committed OpenAPI document lists (openapi.e2e-spec checks it is current). */
function jsonWriteRoutes(): Route[] {
  const document = openApiDocument as unknown as {
    paths: Record<string, Record<string, { requestBody?: { content?: Record<string, { schema?: Schema }> } }>>;
    components: { schemas: Record<string, Schema> };
  };
  const fieldsOf = (schema: Schema | undefined): string[] => {
    if (!schema) return [];
    if (schema.$ref) return fieldsOf(document.components.schemas[schema.$ref.split('/').pop()!]);
    return [...Object.keys(schema.properties ?? {}), ...(schema.allOf ?? []).flatMap(fieldsOf)];
  };
  const routes: Route[] = [];
  for (const [path, operations] of Object.entries(document.paths)) {
    for (const [method, operation] of Object.entries(operations)) {
      if (!['post', 'put', 'patch'].includes(method)) continue;
      const json = operation.requestBody?.content?.['application/json'];
      if (!json) continue; // sign-out takes no body; uploads are multipart (their own spec)
      routes.push({ method: method as Route['method'], path, fields: fieldsOf(json.schema) });
    }
  }
  return routes.sort((a, b) => a.path.localeCompare(b.path) || a.method.localeCompare(b.method));
}

const routes = jsonWriteRoutes();

describe('malformed bodies on every write and estimate route (property, e2e)', () => {
  let t: TestApp;
  let owner: string;
  let admin: string;
  const ids: Record<string, number> = {};

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signIn(t, 'owner@example.com');
    admin = await signIn(t, 'admin@example.com');
    ids.farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
    ids.houseId = (await t.http.get(`/api/farms/${ids.farmId}/houses`).set(bearer(owner)).expect(200)).body[0].id;
    const members = (await t.http.get(`/api/farms/${ids.farmId}/members`).set(bearer(owner)).expect(200))
      .body as Array<{
      userId: number;
      email: string;
    }>;
    ids.userId = members.find((member) => member.email === 'grower@example.com')!.userId;
    ids.id = ids.userId;
  });
  afterAll(() => t.close());

  it('finds the routes in the OpenAPI document', () => {
    expect(routes.length).toBeGreaterThanOrEqual(20);
    expect(routes.map((route) => `${route.method} ${route.path}`)).toEqual(
      expect.arrayContaining([
        'post /api/auth/login',
        'patch /api/houses/{houseId}',
        'post /api/houses/{houseId}/season',
      ]),
    );
  });

  for (const [index, route] of routes.entries()) {
    it(`${route.method.toUpperCase()} ${route.path}: no 5xx, the one error shape, no NaN/Infinity (${RUNS_PER_ROUTE} runs, seed ${SEED + index})`, async () => {
      const url = route.path.replace(/\{(\w+)\}/g, (_, name: string) => String(ids[name] ?? 1));
      const token = route.path.startsWith('/api/users/{id}') ? admin : owner;
      // Text a request of this route sent may be stored and come back in a later answer (a user
      // named "Infinity" by run 3 is still so named at run 9): that is the user's text, not a leak.
      const sentOnRoute = new Set<string>();
      try {
        await fc.assert(
          fc.asyncProperty(hostileBody(route.fields), async (body) => {
            for (const text of stringsIn(body)) sentOnRoute.add(text);
            const res = await t.http[route.method](url)
              .set(bearer(token))
              .set('Content-Type', 'application/json')
              .send(toText(body));
            const where = `${route.method.toUpperCase()} ${url} ${res.status}`;
            expect({ where, serverError: res.status >= 500 }).toEqual({ where, serverError: false });
            if (res.status >= 400) {
              expect(res.body).toMatchObject({
                statusCode: res.status,
                error: expect.any(String),
                message: expect.any(String),
              });
            }
            expect({ where, nonFinite: findNonFinite(res.body, sentOnRoute) }).toEqual({ where, nonFinite: null });
            expect(({} as Record<string, unknown>).polluted).toBeUndefined();
          }),
          { numRuns: RUNS_PER_ROUTE, seed: SEED + index, endOnFailure: true },
        );
      } catch (error) {
        // Counterexamples can be long (a list of 2,000 items): keep the report readable.
        const report = (error as Error).message;
        throw new Error(
          `replay with FUZZ_SEED=${SEED} (this route's seed ${SEED + index})\n${report.length > 3000 ? `${report.slice(0, 3000)}…` : report}`,
          { cause: error },
        );
      }
    }, 180_000);
  }
});
