import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailController } from './mail.controller';
import { MailOutboxService } from './mail-outbox.service';
import { MailService } from './mail.service';
import { MailSend } from './models/mail-send.model';
import { ReceivedMail, ReceivedMailAttachment } from './models/received-mail.model';

@Module({
  imports: [SequelizeModule.forFeature([MailSend, ReceivedMail, ReceivedMailAttachment])],
  controllers: [MailController],
  providers: [MailService, MailOutboxService],
  exports: [MailService],
})
export class MailModule {}
