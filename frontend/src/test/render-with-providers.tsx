import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement, ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { UnitSystemProvider, type UnitSystem } from '../lib/units';

/** Renders a component as the app does: a fresh query client (no retries), a unit system and a router. */
export function renderWithProviders(ui: ReactElement, system: UnitSystem = 'si') {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={queryClient}>
      <UnitSystemProvider system={system}>
        <MemoryRouter>{children}</MemoryRouter>
      </UnitSystemProvider>
    </QueryClientProvider>
  );
  return render(ui, { wrapper });
}
