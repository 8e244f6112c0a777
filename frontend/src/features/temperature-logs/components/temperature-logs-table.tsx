import { DeleteOutlineIcon, ShowChartIcon } from '../../../components/icons';
import {
  IconButton,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Tooltip,
  Typography,
} from '@mui/material';
import type { TemperatureLog } from '../../../api/types';

export interface TemperatureLogsTableProps {
  logs: TemperatureLog[];
  selectedLogId: number | null;
  onPreview: (logId: number) => void;
  /** absent for roles that may not delete logs */
  onDelete?: (log: TemperatureLog) => void;
}

export function TemperatureLogsTable({ logs, selectedLogId, onPreview, onDelete }: TemperatureLogsTableProps) {
  if (logs.length === 0) {
    return <Typography color="text.secondary">No temperature logs stored yet.</Typography>;
  }
  return (
    <TableContainer>
      <Table size="small" aria-label="Stored temperature logs">
        <TableHead>
          <TableRow>
            <TableCell>Name</TableCell>
            <TableCell>From</TableCell>
            <TableCell>To</TableCell>
            <TableCell>Readings</TableCell>
            <TableCell>Kind</TableCell>
            <TableCell align="right">Actions</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {logs.map((log) => (
            <TableRow key={log.id} selected={log.id === selectedLogId}>
              <TableCell component="th" scope="row">
                {log.name}
              </TableCell>
              <TableCell>{log.startDate}</TableCell>
              <TableCell>{log.endDate}</TableCell>
              <TableCell>{log.readingCount.toLocaleString('en-US')}</TableCell>
              <TableCell>{log.resolution === 'hourly' ? 'Hourly' : 'Daily'}</TableCell>
              <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                <Tooltip title={`Preview ${log.name}`}>
                  <IconButton aria-label={`Preview ${log.name}`} onClick={() => onPreview(log.id)}>
                    <ShowChartIcon />
                  </IconButton>
                </Tooltip>
                {onDelete ? (
                  <Tooltip title={`Delete ${log.name}`}>
                    <IconButton aria-label={`Delete ${log.name}`} onClick={() => onDelete(log)}>
                      <DeleteOutlineIcon />
                    </IconButton>
                  </Tooltip>
                ) : null}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
