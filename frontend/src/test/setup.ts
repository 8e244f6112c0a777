import { cleanup } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// Chart.js needs a canvas, which jsdom lacks: component tests see an empty chart.
vi.mock('react-chartjs-2', () => ({
  Bar: () => null,
  Line: () => null,
  Chart: () => null,
}));

afterEach(() => {
  cleanup();
  globalThis.localStorage?.clear();
});
