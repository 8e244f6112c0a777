import { Logger } from '@nestjs/common';
import type { AddressInfo } from 'node:net';
import type { Readable } from 'node:stream';
import { SMTPServer, type SMTPServerSession } from 'smtp-server';
import type { ReceivedMail } from './models/received-mail.model';

/** The largest message the local server accepts (a report PDF is far smaller). */
export const LOCAL_SMTP_MAX_BYTES = 20 * 1024 * 1024;

export interface ParsedIncomingMail {
  envelopeFrom: string | null;
  recipients: string[];
  fromHeader: string | null;
  toHeader: string | null;
  subject: string | null;
  text: string | null;
  messageId: string | null;
  sizeBytes: number;
  attachments: Array<{ fileName: string; contentType: string; content: Buffer }>;
}

export type StoreIncomingMail = (mail: ParsedIncomingMail) => Promise<ReceivedMail>;

function readAll(stream: Readable): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('end', () => resolve(Buffer.concat(chunks)));
    stream.on('error', reject);
  });
}

/**
 * Reads raw MIME into the fields the outbox shows. The MIME parser is loaded with the first
 * message, not at start (about 4 MB of memory a server that sends no mail never uses).
 */
export async function parseIncomingMail(raw: Buffer, session: Pick<SMTPServerSession, 'envelope'>) {
  const { simpleParser } = await import('mailparser');
  const parsed = await simpleParser(raw);
  const addressText = (value: typeof parsed.to): string | null => {
    if (!value) return null;
    return (Array.isArray(value) ? value : [value]).map((a) => a.text).join(', ');
  };
  const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : null;
  return {
    envelopeFrom: envelopeFrom || null,
    recipients: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
    fromHeader: parsed.from?.text ?? null,
    toHeader: addressText(parsed.to),
    subject: parsed.subject ?? null,
    text: parsed.text ?? null,
    messageId: parsed.messageId ?? null,
    sizeBytes: raw.length,
    attachments: parsed.attachments.map((a, index) => ({
      fileName: a.filename ?? `attachment-${index + 1}`,
      contentType: a.contentType || 'application/octet-stream',
      content: a.content,
    })),
  } satisfies ParsedIncomingMail;
}

/**
 * An SMTP server inside the app, on 127.0.0.1 only, that keeps every message it receives (through
 * `store`) instead of relaying it. It takes no authentication and no TLS: nothing but this process
 * on this machine can reach it.
 */
export class LocalSmtpServer {
  private readonly logger = new Logger('LocalSmtp');
  private server: SMTPServer | null = null;
  private boundPort: number | null = null;

  constructor(private readonly store: StoreIncomingMail) {}

  get port(): number {
    if (this.boundPort === null) throw new Error('the local SMTP server is not listening');
    return this.boundPort;
  }

  async start(port: number): Promise<number> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      size: LOCAL_SMTP_MAX_BYTES,
      logger: false,
      banner: 'Thermbay local mail',
      onData: (stream, session, callback) => {
        readAll(stream)
          .then(async (raw) => {
            if ((stream as Readable & { sizeExceeded?: boolean }).sizeExceeded) {
              throw Object.assign(new Error('Message is larger than the local server accepts'), { responseCode: 552 });
            }
            await this.store(await parseIncomingMail(raw, session));
            callback();
          })
          .catch((error: Error) => {
            this.logger.error(`could not keep a received message: ${error.message}`);
            callback(error);
          });
      },
    });
    server.on('error', (error) => this.logger.error(`local SMTP server: ${error.message}`));
    await new Promise<void>((resolve, reject) => {
      const onError = (error: Error) =>
        reject(new Error(`the local SMTP server cannot listen on 127.0.0.1:${port}: ${error.message}`));
      server.server.once('error', onError);
      server.listen(port, '127.0.0.1', () => {
        server.server.off('error', onError);
        resolve();
      });
    });
    this.server = server;
    this.boundPort = (server.server.address() as AddressInfo).port;
    return this.boundPort;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
