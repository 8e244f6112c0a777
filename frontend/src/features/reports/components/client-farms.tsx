import { Link, Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router-dom';
import { ErrorAlert } from '../../../components/feedback';
import { clientFarmsQueryOptions } from '../queries';

/** An adviser's client farms with the newest report of each; nothing for people who advise no farm. */
export function ClientFarms({
  farmPath,
  reportPath,
}: {
  farmPath: (id: number) => string;
  reportPath: (id: number) => string;
}) {
  const clients = useQuery(clientFarmsQueryOptions());
  if (!clients.error && (clients.data ?? []).length === 0) return null;
  return (
    <Paper component="section" aria-labelledby="client-farms-heading" sx={{ p: 2 }}>
      <Typography id="client-farms-heading" variant="h2" sx={{ fontSize: '1.3rem', mb: 1 }}>
        Your client farms
      </Typography>
      <ErrorAlert error={clients.error} title="Client farms could not be loaded" />
      <Stack component="ul" spacing={1} sx={{ m: 0, pl: 2 }}>
        {(clients.data ?? []).map((client) => (
          <li key={client.farmId}>
            <Link component={RouterLink} to={farmPath(client.farmId)}>
              {client.farmName}
            </Link>{' '}
            <Typography component="span" variant="body2" color="text.secondary">
              ({client.houseCount} house{client.houseCount === 1 ? '' : 's'}) — latest report:{' '}
            </Typography>
            {client.latestReport ? (
              <Link component={RouterLink} to={reportPath(client.latestReport.id)}>
                {client.latestReport.title} ({client.latestReport.status},{' '}
                {new Date(client.latestReport.issuedAt ?? client.latestReport.createdAt).toLocaleDateString()})
              </Link>
            ) : (
              <Typography component="span" variant="body2">
                none yet
              </Typography>
            )}
          </li>
        ))}
      </Stack>
    </Paper>
  );
}
