import { ApiProperty } from '@nestjs/swagger';

export class ReceivedAttachmentDto {
  @ApiProperty() id: number;
  @ApiProperty() fileName: string;
  @ApiProperty() contentType: string;
  @ApiProperty() sizeBytes: number;
}

/** A message the in-process SMTP server received. */
export class ReceivedMailDto {
  @ApiProperty() id: number;
  @ApiProperty({ description: 'when the local server received it (ISO 8601)' }) receivedAt: string;
  @ApiProperty({ type: String, nullable: true }) from: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'the To header' }) to: string | null;
  @ApiProperty({ type: String, isArray: true, description: 'envelope recipients: who it was delivered to' })
  recipients: string[];
  @ApiProperty({ type: String, nullable: true }) subject: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'plain-text body' }) text: string | null;
  @ApiProperty({ type: ReceivedAttachmentDto, isArray: true }) attachments: ReceivedAttachmentDto[];
}

/** One send attempt as kept in the send log. */
export class MailSendDto {
  @ApiProperty() id: number;
  @ApiProperty() kind: string;
  @ApiProperty() sentAt: string;
  @ApiProperty({ type: String, isArray: true }) recipients: string[];
  @ApiProperty() subject: string;
  @ApiProperty() text: string;
  @ApiProperty({ type: String, isArray: true }) attachmentNames: string[];
  @ApiProperty({ enum: ['sent', 'failed'] }) status: 'sent' | 'failed';
  @ApiProperty({ type: String, nullable: true, description: 'why it failed' }) error: string | null;
}

export class OutboxDto {
  @ApiProperty({ description: 'false when SMTP_URL sends through a real server (then nothing is kept here)' })
  localServer: boolean;
  @ApiProperty({ type: ReceivedMailDto, isArray: true }) messages: ReceivedMailDto[];
  @ApiProperty({ type: MailSendDto, isArray: true, description: 'sends the SMTP server did not take, newest first' })
  failedSends: MailSendDto[];
}

/** What a send told its sender. */
export class MailOutcomeDto {
  @ApiProperty({ enum: ['sent', 'failed'] }) status: 'sent' | 'failed';
  @ApiProperty({ type: String, nullable: true, description: 'why the message did not go; kept in the send log' })
  error: string | null;
}
