import { Alert, Box, Button, Typography } from '@mui/material';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { errorMessage } from '../../components/feedback';
import { PageTitle } from '../../components/page-title';

/** Shown when a page throws while rendering or its code fails to load. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : errorMessage(error);
  return (
    <Box component="main" sx={{ p: 4, maxWidth: 720, mx: 'auto' }}>
      <PageTitle title={'Something went wrong'} />
      <Typography variant="h1" sx={{ mb: 2 }}>
        Something went wrong
      </Typography>
      <Alert severity="error" sx={{ mb: 2 }}>
        {message}
      </Alert>
      <Button variant="contained" onClick={() => window.location.reload()}>
        Reload the page
      </Button>
    </Box>
  );
}
