import { AttachFileIcon } from '../../../components/icons';
import { Alert, Box, Button, Card, CardContent, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import type { MailSend, ReceivedAttachment, ReceivedMail } from '../../../api/types';
import { errorMessage } from '../../../components/feedback';
import { saveBlob } from '../../../lib/save-blob';
import { downloadAttachment } from '../queries';

function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

function AttachmentButton({ mailId, attachment }: { mailId: number; attachment: ReceivedAttachment }) {
  const [problem, setProblem] = useState<string | null>(null);
  const download = async () => {
    setProblem(null);
    try {
      const file = await downloadAttachment(mailId, attachment.id, attachment.fileName);
      saveBlob(file.blob, file.fileName);
    } catch (error) {
      setProblem(errorMessage(error));
    }
  };
  return (
    <Box>
      <Button size="small" variant="outlined" startIcon={<AttachFileIcon />} onClick={() => void download()}>
        {attachment.fileName} ({formatSize(attachment.sizeBytes)})
      </Button>
      {problem ? <Alert severity="error">{problem}</Alert> : null}
    </Box>
  );
}

/** Received messages, newest first, each with its recipients, subject, body and attachments. */
export function MessageList({ messages, emptyText }: { messages: ReceivedMail[]; emptyText: string }) {
  if (messages.length === 0) return <Typography color="text.secondary">{emptyText}</Typography>;
  return (
    <Stack spacing={2} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Messages">
      {messages.map((message) => (
        <Card component="li" key={message.id} variant="outlined" aria-label={message.subject ?? '(no subject)'}>
          <CardContent>
            <Typography variant="h3" sx={{ fontSize: '1.1rem', fontWeight: 600 }}>
              {message.subject ?? '(no subject)'}
            </Typography>
            <Typography variant="body2" color="text.secondary">
              From {message.from ?? 'unknown'} · to {message.recipients.join(', ')} ·{' '}
              {new Date(message.receivedAt).toLocaleString()}
            </Typography>
            <Typography
              component="pre"
              sx={{ whiteSpace: 'pre-wrap', fontFamily: 'inherit', mt: 1.5, mb: 1.5, overflowWrap: 'anywhere' }}
            >
              {message.text ?? ''}
            </Typography>
            {message.attachments.length > 0 ? (
              <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }} aria-label="Attachments">
                {message.attachments.map((attachment) => (
                  <AttachmentButton key={attachment.id} mailId={message.id} attachment={attachment} />
                ))}
              </Stack>
            ) : null}
          </CardContent>
        </Card>
      ))}
    </Stack>
  );
}

/** Sends the SMTP server did not take: kept with their reason and text. */
export function FailedSendList({ sends }: { sends: MailSend[] }) {
  if (sends.length === 0) return null;
  return (
    <Stack spacing={1} aria-label="Failed sends">
      <Typography variant="h2" sx={{ fontSize: '1.3rem' }}>
        Messages that could not be sent
      </Typography>
      {sends.map((send) => (
        <Alert key={send.id} severity="error">
          <strong>{send.subject}</strong> to {send.recipients.join(', ')} ({new Date(send.sentAt).toLocaleString()}):{' '}
          {send.error ?? 'failed'}
        </Alert>
      ))}
    </Stack>
  );
}
