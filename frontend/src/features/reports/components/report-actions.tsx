import {
  Alert,
  Button,
  Checkbox,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControlLabel,
  FormGroup,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import type { Report, ReportSent } from '../../../api/types';
import { ErrorAlert, errorMessage } from '../../../components/feedback';
import { saveBlob } from '../../../lib/save-blob';
import { useIssueReport, useReviseReport, useSendReport, useUpdateReport } from '../mutations';
import { downloadReportPdf } from '../queries';

export interface MemberChoice {
  userId: number;
  name: string;
  email: string;
}

const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function SendDialog({ report, members, onClose }: { report: Report; members: MemberChoice[]; onClose: () => void }) {
  const send = useSendReport(report.id);
  const [chosen, setChosen] = useState<number[]>([]);
  const [others, setOthers] = useState('');
  const [message, setMessage] = useState('');
  const [result, setResult] = useState<ReportSent | null>(null);
  const emails = others
    .split(/[\s,;]+/)
    .map((e) => e.trim())
    .filter(Boolean);
  const badEmail = emails.find((email) => !EMAIL_PATTERN.test(email));
  const nothingChosen = chosen.length === 0 && emails.length === 0;
  return (
    <Dialog open onClose={onClose} aria-labelledby="send-report-title" fullWidth maxWidth="sm">
      <DialogTitle id="send-report-title">E-mail this report as PDF</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ mt: 1 }}>
          <FormGroup aria-label="Farm members">
            {members.map((member) => (
              <FormControlLabel
                key={member.userId}
                control={
                  <Checkbox
                    checked={chosen.includes(member.userId)}
                    onChange={(event) =>
                      setChosen((previous) =>
                        event.target.checked
                          ? [...previous, member.userId]
                          : previous.filter((id) => id !== member.userId),
                      )
                    }
                  />
                }
                label={`${member.name} (${member.email})`}
              />
            ))}
          </FormGroup>
          <TextField
            label="Other e-mail addresses"
            helperText={badEmail ? `“${badEmail}” is not an e-mail address` : 'Separate several with commas'}
            error={Boolean(badEmail)}
            value={others}
            onChange={(event) => setOthers(event.target.value)}
          />
          <TextField
            label="Short message"
            multiline
            minRows={2}
            value={message}
            onChange={(event) => setMessage(event.target.value)}
            slotProps={{ htmlInput: { maxLength: 2000 } }}
          />
          <ErrorAlert error={send.error} title="The report was not sent" />
          {result?.status === 'sent' ? (
            <Alert severity="success" role="status">
              Sent to {result.recipients.join(', ')}.
            </Alert>
          ) : null}
          {result?.status === 'failed' ? (
            <Alert severity="error" role="alert">
              The e-mail could not be sent: {result.error}. It is kept as failed; try again later.
            </Alert>
          ) : null}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
        <Button
          variant="contained"
          disabled={send.isPending || nothingChosen || Boolean(badEmail)}
          onClick={() =>
            send.mutate(
              { memberUserIds: chosen, emails, message: message.trim() || undefined },
              { onSuccess: setResult },
            )
          }
        >
          {send.isPending ? 'Sending…' : 'Send'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/** Download, print, send; and for a writer: edit the text, issue, revise. */
export function ReportActions({
  report,
  members,
  onRevised,
}: {
  report: Report;
  members: MemberChoice[];
  onRevised: (report: Report) => void;
}) {
  const [sending, setSending] = useState(false);
  const [downloadProblem, setDownloadProblem] = useState<string | null>(null);
  const issue = useIssueReport(report.id);
  const revise = useReviseReport(report.id);
  const download = async () => {
    setDownloadProblem(null);
    try {
      const file = await downloadReportPdf(report.id);
      saveBlob(file.blob, file.fileName);
    } catch (error) {
      setDownloadProblem(errorMessage(error));
    }
  };
  return (
    <Stack spacing={1} className="no-print">
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button variant="contained" onClick={() => void download()}>
          Download PDF
        </Button>
        <Button variant="outlined" onClick={() => window.print()}>
          Print
        </Button>
        {report.canWrite ? (
          <Button variant="outlined" onClick={() => setSending(true)}>
            E-mail PDF
          </Button>
        ) : null}
        {report.canWrite && report.status === 'draft' ? (
          <Button variant="outlined" disabled={issue.isPending} onClick={() => issue.mutate()}>
            Issue report
          </Button>
        ) : null}
        {report.canWrite && report.status === 'issued' ? (
          <Button
            variant="outlined"
            disabled={revise.isPending}
            onClick={() => revise.mutate(undefined, { onSuccess: onRevised })}
          >
            New revision
          </Button>
        ) : null}
      </Stack>
      {downloadProblem ? <Alert severity="error">{downloadProblem}</Alert> : null}
      <ErrorAlert error={issue.error ?? revise.error} />
      {report.status === 'issued' ? (
        <Typography variant="body2" color="text.secondary">
          Issued reports are read-only. Start a new revision to change it.
        </Typography>
      ) : null}
      {sending ? <SendDialog report={report} members={members} onClose={() => setSending(false)} /> : null}
    </Stack>
  );
}

/** The adviser's text of a draft report. */
export function ReportTextEditor({ report }: { report: Report }) {
  const update = useUpdateReport(report.id);
  const [title, setTitle] = useState(report.title);
  const [notes, setNotes] = useState(report.notes);
  const [recommendations, setRecommendations] = useState(report.recommendations);
  const [saved, setSaved] = useState(false);
  return (
    <Stack
      component="form"
      spacing={2}
      aria-label="Report text"
      className="no-print"
      onSubmit={(event) => {
        event.preventDefault();
        setSaved(false);
        update.mutate({ title: title.trim(), notes, recommendations }, { onSuccess: () => setSaved(true) });
      }}
    >
      <TextField label="Title" value={title} required onChange={(event) => setTitle(event.target.value)} />
      <TextField
        label="Notes"
        multiline
        minRows={3}
        value={notes}
        onChange={(event) => setNotes(event.target.value)}
        helperText="Plain text; a blank line starts a new paragraph."
      />
      <TextField
        label="Recommendations"
        multiline
        minRows={3}
        value={recommendations}
        onChange={(event) => setRecommendations(event.target.value)}
      />
      <ErrorAlert error={update.error} title="Not saved" />
      {saved ? (
        <Alert severity="success" role="status">
          Report saved.
        </Alert>
      ) : null}
      <Button
        type="submit"
        variant="contained"
        disabled={update.isPending || !title.trim()}
        sx={{ alignSelf: 'flex-start' }}
      >
        {update.isPending ? 'Saving…' : 'Save report'}
      </Button>
    </Stack>
  );
}
