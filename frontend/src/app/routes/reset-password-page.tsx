import { Link, Typography } from '@mui/material';
import { PageTitle } from '../../components/page-title';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { ResetPasswordForm } from '../../features/auth';
import { AuthLayout } from './auth-layout';

export default function ResetPasswordPage() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  return (
    <AuthLayout>
      <PageTitle title={'New password'} />
      <ResetPasswordForm token={token} onReset={() => navigate(paths.farms, { replace: true })} />
      <Typography sx={{ mt: 3 }}>
        Link not working?{' '}
        <Link component={RouterLink} to={paths.forgotPassword}>
          Ask for a new one
        </Link>
      </Typography>
    </AuthLayout>
  );
}
