import { Link, Typography } from '@mui/material';
import { Link as RouterLink, Navigate, useLocation, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';
import { SignInForm } from '../../features/auth';
import { useAccessToken } from '../session';
import { AuthLayout } from './auth-layout';
import { PageTitle } from '../../components/page-title';

function returnPath(state: unknown): string {
  const from = (state as { from?: unknown } | null)?.from;
  return typeof from === 'string' && from.startsWith('/') && !from.startsWith('//') ? from : paths.farms;
}

export default function LoginPage() {
  const token = useAccessToken();
  const location = useLocation();
  const navigate = useNavigate();
  const target = returnPath(location.state);
  if (token) return <Navigate to={target} replace />;
  return (
    <AuthLayout>
      <PageTitle title={'Sign in'} />
      <SignInForm onSignedIn={() => navigate(target, { replace: true })} />
      <Typography sx={{ mt: 2 }}>
        <Link component={RouterLink} to={paths.forgotPassword}>
          Forgot your password?
        </Link>
      </Typography>
      <Typography sx={{ mt: 1 }}>
        New here?{' '}
        <Link component={RouterLink} to={paths.register}>
          Create an account
        </Link>
      </Typography>
    </AuthLayout>
  );
}
