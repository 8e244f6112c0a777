import { Controller, Get, Param, ParseIntPipe, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { SiteRoles } from '../common/decorators/site-roles.decorator';
import { OutboxDto, ReceivedMailDto } from './dto/mail.dto';
import { MailOutboxService } from './mail-outbox.service';

/** A header-safe file name for Content-Disposition (the UTF-8 form carries the real one). */
export function contentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}

@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail')
export class MailController {
  constructor(private readonly outbox: MailOutboxService) {}

  @Get('outbox')
  @SiteRoles('admin')
  @ApiOperation({ summary: 'Every message the local SMTP server kept, and every send that failed (site admin)' })
  @ApiOkResponse({ type: OutboxDto })
  all(): Promise<OutboxDto> {
    return this.outbox.outbox();
  }

  @Get('inbox')
  @ApiOperation({ summary: 'Messages the local SMTP server kept for the signed-in user' })
  @ApiOkResponse({ type: ReceivedMailDto, isArray: true })
  mine(@CurrentUser() me: AuthenticatedUser): Promise<ReceivedMailDto[]> {
    return this.outbox.inbox(me);
  }

  @Get('messages/:mailId/attachments/:attachmentId')
  @ApiOperation({ summary: 'Download an attachment (site admin, or a recipient of the message)' })
  @ApiProduces('application/octet-stream')
  @ApiOkResponse({ description: 'the attachment as received' })
  @ApiNotFoundResponse({ description: 'no such message or attachment, or not yours' })
  async download(
    @CurrentUser() me: AuthenticatedUser,
    @Param('mailId', ParseIntPipe) mailId: number,
    @Param('attachmentId', ParseIntPipe) attachmentId: number,
    @Res() response: Response,
  ): Promise<void> {
    const attachment = await this.outbox.attachment(me, mailId, attachmentId);
    response.setHeader('Content-Type', attachment.contentType);
    response.setHeader('Content-Disposition', contentDisposition(attachment.fileName));
    response.send(Buffer.from(attachment.content));
  }
}
