// @vitest-environment node
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import openapiTS, { astToString, COMMENT_HEADER } from 'openapi-typescript';
import { describe, expect, it } from 'vitest';

/**
 * The stale-types check: the frontend's API types are generated from the backend's OpenAPI
 * document. Regenerating them must reproduce src/api/schema.d.ts byte for byte; if not, run
 * `npm run openapi -w @thermbay/backend && npm run gen:api -w @thermbay/frontend` and commit both files.
 */
const openApiUrl = new URL('../../../backend/openapi.json', import.meta.url);
const schemaPath = fileURLToPath(new URL('./schema.d.ts', import.meta.url));

describe('generated API types', () => {
  it('backend/openapi.json exists (written by `npm run openapi -w @thermbay/backend`)', () => {
    expect(existsSync(openApiUrl), `missing ${fileURLToPath(openApiUrl)}`).toBe(true);
  });

  it('src/api/schema.d.ts matches what openapi-typescript generates from it', async () => {
    expect(existsSync(schemaPath), 'missing src/api/schema.d.ts: run `npm run gen:api -w @thermbay/frontend`').toBe(
      true,
    );
    // Same call and header as the openapi-typescript CLI that `gen:api` runs.
    const regenerated = `${COMMENT_HEADER}${astToString(await openapiTS(openApiUrl, { silent: true }))}`;
    const committed = readFileSync(schemaPath, 'utf8');
    expect(committed === regenerated, 'src/api/schema.d.ts is stale: run `npm run gen:api -w @thermbay/frontend`').toBe(
      true,
    );
  });
});
