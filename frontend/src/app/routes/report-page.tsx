import { Breadcrumbs, GlobalStyles, Link, Paper, Stack, Typography } from '@mui/material';
import { PageTitle } from '../../components/page-title';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { paths } from '../../config/paths';
import { farmMembersQueryOptions } from '../../features/members';
import { ReportActions, reportQueryOptions, ReportTextEditor, ReportView } from '../../features/reports';
import { useCurrentUser } from '../session';

/** Printing the page prints the report only: no top bar, navigation, buttons or form. */
const printStyles = (
  <GlobalStyles
    styles={{
      '@media print': {
        'header, nav, .no-print, .MuiAppBar-root, .MuiBreadcrumbs-root': { display: 'none !important' },
        'main, .MuiContainer-root': { padding: '0 !important', maxWidth: 'none !important' },
        '.report-print': { boxShadow: 'none !important' },
        '.report-print-frame': { boxShadow: 'none !important', border: 'none !important', padding: '0 !important' },
        body: { background: '#fff' },
      },
    }}
  />
);

export default function ReportPage() {
  const reportId = Number(useParams().reportId);
  const navigate = useNavigate();
  const currentUser = useCurrentUser();
  const report = useQuery({
    ...reportQueryOptions(reportId, currentUser.data?.unitSystem),
    enabled: Boolean(currentUser.data),
  });
  const members = useQuery({
    ...farmMembersQueryOptions(report.data?.farmId ?? 0),
    enabled: Boolean(report.data?.canWrite),
  });

  if (report.isError) return <ErrorAlert error={report.error} title="The report could not be loaded" />;
  if (!report.data) return <LoadingState label="Loading report…" />;
  const data = report.data;
  return (
    <Stack spacing={2}>
      <PageTitle title={report.data?.title ?? 'Report'} />
      {printStyles}
      <Breadcrumbs aria-label="Breadcrumb">
        <Link component={RouterLink} to={paths.farm(data.farmId)}>
          {data.document.farmName}
        </Link>
        {data.houseId !== null ? (
          <Link component={RouterLink} to={paths.house(data.houseId)}>
            {data.houseName}
          </Link>
        ) : (
          <Typography>{data.houseName} (deleted)</Typography>
        )}
        <Typography color="text.primary">Report</Typography>
      </Breadcrumbs>
      <ReportActions
        report={data}
        members={(members.data ?? []).map((m) => ({ userId: m.userId, name: m.name, email: m.email }))}
        onRevised={(revision) => navigate(paths.report(revision.id))}
      />
      {data.canWrite && data.status === 'draft' ? <ReportTextEditor key={data.id} report={data} /> : null}
      <Paper className="report-print-frame" sx={{ p: { xs: 2, md: 4 } }}>
        <ReportView document={data.document} />
      </Paper>
    </Stack>
  );
}
