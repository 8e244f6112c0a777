import { Button, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';
import { AuthLayout } from './auth-layout';
import { PageTitle } from '../../components/page-title';

export default function NotFoundPage() {
  return (
    <AuthLayout>
      <PageTitle title={'Page not found'} />
      <Typography variant="h1" sx={{ mb: 2 }}>
        Page not found
      </Typography>
      <Typography sx={{ mb: 3 }}>There is no page at this address.</Typography>
      <Button variant="contained" component={RouterLink} to={paths.farms}>
        Go to your farms
      </Button>
    </AuthLayout>
  );
}
