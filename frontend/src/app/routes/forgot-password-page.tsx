import { Link, Typography } from '@mui/material';
import { PageTitle } from '../../components/page-title';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';
import { ForgotPasswordForm } from '../../features/auth';
import { AuthLayout } from './auth-layout';

export default function ForgotPasswordPage() {
  return (
    <AuthLayout>
      <PageTitle title={'Forgotten password'} />
      <ForgotPasswordForm />
      <Typography sx={{ mt: 3 }}>
        <Link component={RouterLink} to={paths.login}>
          Back to sign in
        </Link>
      </Typography>
    </AuthLayout>
  );
}
