import { Alert, Button, Link, Paper, Stack, TextField, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import type { Report, ReportSummary } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { useCreateReport } from '../mutations';
import { houseReportsQueryOptions } from '../queries';

export function ReportLinks({ reports, reportPath }: { reports: ReportSummary[]; reportPath: (id: number) => string }) {
  if (reports.length === 0) return <Typography color="text.secondary">No reports yet.</Typography>;
  return (
    <Stack component="ul" spacing={0.5} sx={{ m: 0, pl: 2 }} aria-label="Reports">
      {reports.map((report) => (
        <li key={report.id}>
          <Link component={RouterLink} to={reportPath(report.id)}>
            {report.title}
          </Link>{' '}
          <Typography component="span" variant="body2" color="text.secondary">
            — {report.houseName}, {report.status} r{report.revision}, {report.authorName},{' '}
            {new Date(report.issuedAt ?? report.createdAt).toLocaleDateString()}
          </Typography>
        </li>
      ))}
    </Stack>
  );
}

/** A house's reports, and (for report:write) the start of a new one. */
export function HouseReports({
  houseId,
  houseName,
  canWrite,
  reportPath,
  onCreated,
}: {
  houseId: number;
  houseName: string;
  canWrite: boolean;
  reportPath: (id: number) => string;
  onCreated: (report: Report) => void;
}) {
  const reports = useQuery(houseReportsQueryOptions(houseId));
  const create = useCreateReport(houseId);
  const [title, setTitle] = useState(`Heater sizing — ${houseName}`);
  return (
    <Paper component="section" aria-labelledby="house-reports-heading" sx={{ p: 2 }}>
      <Stack spacing={1.5}>
        <Typography id="house-reports-heading" variant="h2" sx={{ fontSize: '1.3rem' }}>
          Heater-sizing reports
        </Typography>
        <ErrorAlert error={reports.error} title="Reports could not be loaded" />
        <ReportLinks reports={reports.data ?? []} reportPath={reportPath} />
        {canWrite ? (
          <Stack
            component="form"
            direction={{ xs: 'column', sm: 'row' }}
            spacing={1}
            aria-label="New report"
            onSubmit={(event) => {
              event.preventDefault();
              if (title.trim()) create.mutate({ title: title.trim() }, { onSuccess: onCreated });
            }}
          >
            <TextField
              size="small"
              label="Report title"
              value={title}
              onChange={(event) => setTitle(event.target.value)}
              slotProps={{ htmlInput: { maxLength: 200 } }}
              sx={{ flexGrow: 1 }}
            />
            <Button type="submit" variant="contained" disabled={create.isPending || !title.trim()}>
              {create.isPending ? 'Saving…' : 'Create report'}
            </Button>
          </Stack>
        ) : null}
        {canWrite ? (
          <Typography variant="body2" color="text.secondary">
            A report saves the house, the farm&apos;s climate and every result as they are now; later edits do not
            change it.
          </Typography>
        ) : null}
        {create.error ? <Alert severity="error">{String(create.error.message)}</Alert> : null}
      </Stack>
    </Paper>
  );
}
