import { Box, Container, Paper, Typography } from '@mui/material';
import type { ReactNode } from 'react';

/** The frame of the public pages (sign in, register, not found). */
export function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <Box component="main" sx={{ minHeight: '100vh', bgcolor: 'background.default', py: { xs: 3, sm: 8 } }}>
      <Container maxWidth="sm">
        <Typography
          component="p"
          sx={{ color: 'primary.main', fontWeight: 700, fontSize: '1.6rem', mb: 0.5, letterSpacing: 0.5 }}
        >
          Thermbay
        </Typography>
        <Typography color="text.secondary" sx={{ mb: 3 }}>
          Heating, cooling and fuel budgets for commercial greenhouses.
        </Typography>
        <Paper sx={{ p: { xs: 2, sm: 4 } }}>{children}</Paper>
      </Container>
    </Box>
  );
}
