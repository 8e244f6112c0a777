import { Link, Typography } from '@mui/material';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';
import { RegisterForm } from '../../features/auth';
import { AuthLayout } from './auth-layout';
import { PageTitle } from '../../components/page-title';

export default function RegisterPage() {
  const navigate = useNavigate();
  return (
    <AuthLayout>
      <PageTitle title={'Create an account'} />
      <RegisterForm onRegistered={() => navigate(paths.farms, { replace: true })} />
      <Typography sx={{ mt: 3 }}>
        Already have an account?{' '}
        <Link component={RouterLink} to={paths.login}>
          Sign in
        </Link>
      </Typography>
    </AuthLayout>
  );
}
