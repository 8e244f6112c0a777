import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import type { MailSendDto, OutboxDto, ReceivedMailDto } from './dto/mail.dto';
import { MailService } from './mail.service';
import { MailSend } from './models/mail-send.model';
import { ReceivedMail, ReceivedMailAttachment } from './models/received-mail.model';

const ATTACHMENT_META = ['id', 'receivedMailId', 'fileName', 'contentType', 'sizeBytes'];

function toReceivedDto(row: ReceivedMail): ReceivedMailDto {
  return {
    id: row.id,
    receivedAt: row.createdAt.toISOString(),
    from: row.fromHeader,
    to: row.toHeader,
    recipients: row.recipients,
    subject: row.subject,
    text: row.text,
    attachments: (row.attachments ?? []).map((a) => ({
      id: a.id,
      fileName: a.fileName,
      contentType: a.contentType,
      sizeBytes: a.sizeBytes,
    })),
  };
}

export function toMailSendDto(row: MailSend): MailSendDto {
  return {
    id: row.id,
    kind: row.kind,
    sentAt: row.createdAt.toISOString(),
    recipients: row.recipients,
    subject: row.subject,
    text: row.text,
    attachmentNames: row.attachmentNames,
    status: row.status,
    error: row.error,
  };
}

/** Reading what the local SMTP server kept: all of it for the site admin, their own for a user. */
@Injectable()
export class MailOutboxService {
  constructor(
    private readonly mail: MailService,
    @InjectModel(ReceivedMail) private readonly received: typeof ReceivedMail,
    @InjectModel(ReceivedMailAttachment) private readonly attachments: typeof ReceivedMailAttachment,
    @InjectModel(MailSend) private readonly sends: typeof MailSend,
  ) {}

  async outbox(): Promise<OutboxDto> {
    const rows = await this.received.findAll({
      include: [{ model: ReceivedMailAttachment, attributes: ATTACHMENT_META }],
      order: [['id', 'DESC']],
    });
    const failed = await this.sends.findAll({ where: { status: 'failed' }, order: [['id', 'DESC']] });
    return {
      localServer: this.mail.usesLocalServer,
      messages: rows.map(toReceivedDto),
      failedSends: failed.map(toMailSendDto),
    };
  }

  async inbox(user: AuthenticatedUser): Promise<ReceivedMailDto[]> {
    const rows = await this.received.findAll({
      include: [{ model: ReceivedMailAttachment, attributes: ATTACHMENT_META }],
      order: [['id', 'DESC']],
    });
    // Recipients are a JSON list; filtering here keeps the query the same on SQLite and PostgreSQL.
    const me = user.email.toLowerCase();
    return rows.filter((row) => row.recipients.includes(me)).map(toReceivedDto);
  }

  /** An attachment for the site admin or a recipient of its message; anyone else: 404. */
  async attachment(user: AuthenticatedUser, mailId: number, attachmentId: number): Promise<ReceivedMailAttachment> {
    const mail = await this.received.findByPk(mailId);
    const allowed = mail && (user.siteRole === 'admin' || mail.recipients.includes(user.email.toLowerCase()));
    if (!allowed) throw new NotFoundException('No such message');
    const attachment = await this.attachments.findOne({ where: { id: attachmentId, receivedMailId: mailId } });
    if (!attachment) throw new NotFoundException('No such attachment');
    return attachment;
  }
}
