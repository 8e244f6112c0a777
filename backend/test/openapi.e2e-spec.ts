import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { buildOpenApiDocument } from '../src/app.setup';
import { createTestApp, type TestApp } from './test-app';

/**
 * backend/openapi.json is the contract the frontend's types are generated from. If a DTO or a
 * route changes without `npm run openapi -w @thermbay/backend` (and then `npm run gen:api -w @thermbay/frontend`),
 * this fails; the frontend has the matching check for its generated file.
 */
describe('OpenAPI contract (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ DEMO_SEED: 'false' });
  });
  afterAll(() => t.close());

  it('backend/openapi.json matches the running app', () => {
    const committed = JSON.parse(readFileSync(resolve(__dirname, '..', 'openapi.json'), 'utf8'));
    const live = JSON.parse(JSON.stringify(buildOpenApiDocument(t.app)));
    expect(live).toEqual(committed);
  });
});
