import { Injectable, Logger, OnModuleDestroy, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { createTransport, type Transporter } from 'nodemailer';
import type { Environment } from '../config/environment';
import { LocalSmtpServer, type ParsedIncomingMail } from './local-smtp-server';
import { MailSend, type MailSendStatus } from './models/mail-send.model';
import { ReceivedMail, ReceivedMailAttachment } from './models/received-mail.model';

export interface OutgoingAttachment {
  fileName: string;
  contentType: string;
  content: Buffer;
}

export interface OutgoingMail {
  /** what the message is, for the send log: report, invitation, password-reset … */
  kind: string;
  senderUserId?: number | null;
  to: string[];
  subject: string;
  text: string;
  attachments?: OutgoingAttachment[];
}

export interface MailSendResult {
  sendId: number;
  status: MailSendStatus;
  /** why the SMTP server did not take the message; null when sent */
  error: string | null;
}

/** Seconds nodemailer waits on an SMTP server before the send counts as failed. */
const SMTP_TIMEOUT_MS = 15_000;

/**
 * Sends every message over SMTP with nodemailer: to the in-process local server by default, or
 * to the server SMTP_URL names. Every attempt is kept in `mail_sends`, a failure with its
 * reason and the full text, so that no message is lost; the caller is told the outcome.
 */
@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private transport: Transporter | null = null;
  private localServer: LocalSmtpServer | null = null;

  constructor(
    private readonly config: ConfigService<Environment, true>,
    @InjectModel(MailSend) private readonly sends: typeof MailSend,
    @InjectModel(ReceivedMail) private readonly received: typeof ReceivedMail,
    @InjectModel(ReceivedMailAttachment) private readonly receivedAttachments: typeof ReceivedMailAttachment,
  ) {}

  async onModuleInit(): Promise<void> {
    const smtpUrl = this.config.get('SMTP_URL', { infer: true });
    const timeouts = {
      connectionTimeout: SMTP_TIMEOUT_MS,
      greetingTimeout: SMTP_TIMEOUT_MS,
      socketTimeout: SMTP_TIMEOUT_MS,
    };
    if (smtpUrl) {
      this.transport = createTransport({ url: smtpUrl, ...timeouts });
      return;
    }
    this.localServer = new LocalSmtpServer((mail) => this.keepReceived(mail));
    const port = await this.localServer.start(this.config.get('SMTP_LOCAL_PORT', { infer: true }));
    this.logger.log(`local SMTP server on 127.0.0.1:${port} keeps every message (outbox at /admin/outbox)`);
    this.transport = createTransport({
      host: '127.0.0.1',
      port,
      secure: false,
      ignoreTLS: true,
      ...timeouts,
    });
  }

  async onModuleDestroy(): Promise<void> {
    this.transport?.close();
    this.transport = null;
    await this.localServer?.stop();
  }

  /** Whether messages stay in this app's outbox (no real SMTP server configured). */
  get usesLocalServer(): boolean {
    return this.localServer !== null;
  }

  get fromAddress(): string {
    return this.config.get('MAIL_FROM', { infer: true });
  }

  /** Link into the app for a message, e.g. link('/reset-password/abc'). */
  link(path: string): string {
    return `${this.config.get('PUBLIC_URL', { infer: true })}${path}`;
  }

  /** Sends one message; never throws for an SMTP failure, which is kept and returned. */
  async send(mail: OutgoingMail): Promise<MailSendResult> {
    const attachments = mail.attachments ?? [];
    let status: MailSendStatus = 'sent';
    let error: string | null = null;
    let messageId: string | null = null;
    try {
      if (!this.transport) throw new Error('mail is not set up yet');
      const info = await this.transport.sendMail({
        from: this.fromAddress,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        attachments: attachments.map((a) => ({
          filename: a.fileName,
          contentType: a.contentType,
          content: a.content,
        })),
      });
      messageId = typeof info.messageId === 'string' ? info.messageId : null;
      const rejected = (info.rejected ?? []).map(String);
      if (rejected.length > 0) {
        status = 'failed';
        error = `the SMTP server refused ${rejected.join(', ')}`;
      }
    } catch (cause) {
      status = 'failed';
      error = describeSmtpError(cause);
    }
    const row = await this.sends.create({
      kind: mail.kind,
      senderUserId: mail.senderUserId ?? null,
      fromAddress: this.fromAddress,
      recipients: mail.to,
      subject: mail.subject,
      text: mail.text,
      attachmentNames: attachments.map((a) => a.fileName),
      status,
      error,
      messageId,
    });
    if (status === 'failed')
      this.logger.warn(`mail ${row.id} (${mail.kind}) to ${mail.to.join(', ')} failed: ${error}`);
    return { sendId: row.id, status, error };
  }

  private async keepReceived(mail: ParsedIncomingMail): Promise<ReceivedMail> {
    const sequelize = this.received.sequelize!;
    return sequelize.transaction(async (transaction) => {
      const row = await this.received.create(
        {
          envelopeFrom: mail.envelopeFrom,
          recipients: mail.recipients,
          fromHeader: mail.fromHeader,
          toHeader: mail.toHeader,
          subject: mail.subject,
          text: mail.text,
          messageId: mail.messageId,
          sizeBytes: mail.sizeBytes,
        },
        { transaction },
      );
      for (const attachment of mail.attachments) {
        await this.receivedAttachments.create(
          {
            receivedMailId: row.id,
            fileName: attachment.fileName,
            contentType: attachment.contentType,
            sizeBytes: attachment.content.length,
            content: attachment.content,
          },
          { transaction },
        );
      }
      return row;
    });
  }
}

/** A reason a person can act on, from nodemailer's error. */
export function describeSmtpError(cause: unknown): string {
  // duck-typed: errors from another realm (a worker, a test sandbox) are not `instanceof Error`
  if (typeof cause !== 'object' || cause === null || typeof (cause as Error).message !== 'string') {
    return 'the message could not be sent';
  }
  const { code, message } = cause as Error & { code?: string };
  if (code === 'ECONNECTION' || /ECONNREFUSED/.test(message)) return `the mail server cannot be reached (${message})`;
  if (code === 'ETIMEDOUT') return `the mail server did not answer in time (${message})`;
  if (code === 'EAUTH') return `the mail server refused the sign-in (${message})`;
  return message;
}
