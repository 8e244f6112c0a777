import { cleanup } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// Chart.js needs a canvas, which jsdom lacks: component tests see an empty chart.
vi.mock('react-chartjs-2', () => ({
  Bar: () => null,
  Line: () => null,
  Chart: () => null,
}));

// Unit tests reach no server: a request that no test answers fails as an unreachable server would
// (the client sends absolute URLs, which the real fetch would otherwise try to open).
globalThis.fetch = async () => {
  throw new TypeError('No server in unit tests: stub fetch (see src/test/fake-api.ts)');
};

afterEach(() => {
  cleanup();
  globalThis.localStorage?.clear();
});
