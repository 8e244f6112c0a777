import { AccountCircleIcon } from '../components/icons';
import {
  AppBar,
  Box,
  Button,
  Container,
  Divider,
  IconButton,
  Link,
  ListItemText,
  Menu,
  MenuItem,
  Toolbar,
  Typography,
} from '@mui/material';
import { Suspense, useState } from 'react';
import { Link as RouterLink, Outlet, ScrollRestoration, useNavigate } from 'react-router-dom';
import { LoadingState } from '../components/feedback';
import { paths } from '../config/paths';
import { useLogout } from '../features/auth';
import { UnitSystemToggle } from '../features/settings';
import { useCurrentUser, useSetCurrentUser } from './session';

export function AppShell() {
  const currentUser = useCurrentUser();
  const setCurrentUser = useSetCurrentUser();
  const logout = useLogout();
  const navigate = useNavigate();
  const [menuAnchor, setMenuAnchor] = useState<HTMLElement | null>(null);
  const user = currentUser.data;

  const signOut = () => {
    setMenuAnchor(null);
    logout.mutate(undefined, { onSettled: () => navigate(paths.login, { replace: true }) });
  };

  return (
    <Box sx={{ minHeight: '100vh', display: 'flex', flexDirection: 'column' }}>
      {/* A new page starts at its top (e.g. after "Create house" at the foot of a long form). */}
      <ScrollRestoration />
      <Link
        href="#main-content"
        sx={{
          position: 'absolute',
          left: -9999,
          '&:focus': { left: 8, top: 8, zIndex: 2000, bgcolor: 'background.paper', p: 1 },
        }}
      >
        Skip to main content
      </Link>
      <AppBar position="sticky">
        <Toolbar sx={{ gap: { xs: 0.5, sm: 2 }, px: { xs: 1, sm: 2 } }}>
          <Typography
            component={RouterLink}
            to={paths.farms}
            variant="h6"
            sx={{ color: 'inherit', textDecoration: 'none', fontWeight: 700, letterSpacing: 0.5 }}
          >
            Thermbay
          </Typography>
          <Box component="nav" aria-label="Main" sx={{ display: 'flex', gap: 1, flexGrow: 1 }}>
            <Button color="inherit" component={RouterLink} to={paths.farms}>
              Farms
            </Button>
            <Button color="inherit" component={RouterLink} to={paths.messages}>
              Messages
            </Button>
            {/* on a phone, Settings is in the account menu only */}
            <Button
              color="inherit"
              component={RouterLink}
              to={paths.settings}
              sx={{ display: { xs: 'none', sm: 'inline-flex' } }}
            >
              Settings
            </Button>
            {user?.siteRole === 'admin' ? (
              <Button color="inherit" component={RouterLink} to={paths.adminUsers}>
                Users
              </Button>
            ) : null}
            {user?.siteRole === 'admin' ? (
              <Button color="inherit" component={RouterLink} to={paths.adminOutbox}>
                Outbox
              </Button>
            ) : null}
          </Box>
          {user ? <UnitSystemToggle user={user} onUpdated={setCurrentUser} /> : null}
          <IconButton
            color="inherit"
            aria-label="Account menu"
            aria-haspopup="menu"
            aria-controls={menuAnchor ? 'account-menu' : undefined}
            aria-expanded={menuAnchor ? 'true' : undefined}
            onClick={(event) => setMenuAnchor(event.currentTarget)}
          >
            <AccountCircleIcon />
          </IconButton>
          <Menu id="account-menu" anchorEl={menuAnchor} open={Boolean(menuAnchor)} onClose={() => setMenuAnchor(null)}>
            {user ? (
              <MenuItem disabled sx={{ '&.Mui-disabled': { opacity: 1 } }}>
                <ListItemText primary={user.name} secondary={user.email} />
              </MenuItem>
            ) : null}
            {user ? <Divider /> : null}
            <MenuItem
              onClick={() => {
                setMenuAnchor(null);
                navigate(paths.settings);
              }}
            >
              Settings
            </MenuItem>
            <MenuItem onClick={signOut}>Sign out</MenuItem>
          </Menu>
        </Toolbar>
      </AppBar>
      <Container component="main" id="main-content" tabIndex={-1} maxWidth="xl" sx={{ py: 3, flexGrow: 1 }}>
        <Suspense fallback={<LoadingState />}>
          <Outlet />
        </Suspense>
      </Container>
    </Box>
  );
}
