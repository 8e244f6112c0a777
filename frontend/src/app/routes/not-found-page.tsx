import { Button, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '../../config/paths';
import { AuthLayout } from './auth-layout';

export default function NotFoundPage() {
  return (
    <AuthLayout>
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
