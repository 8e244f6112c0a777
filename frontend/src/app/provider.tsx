import { CssBaseline, ThemeProvider } from '@mui/material';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { createQueryClient } from '../lib/query-client';
import { UnitSystemProvider } from '../lib/units';
import { theme } from '../theme';
import { useCurrentUser } from './session';

/** Every number in the app follows the signed-in user's unit preference. */
function CurrentUserUnits({ children }: { children: ReactNode }) {
  const currentUser = useCurrentUser();
  return <UnitSystemProvider system={currentUser.data?.unitSystem ?? 'si'}>{children}</UnitSystemProvider>;
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <QueryClientProvider client={client}>
        <CurrentUserUnits>{children}</CurrentUserUnits>
      </QueryClientProvider>
    </ThemeProvider>
  );
}
