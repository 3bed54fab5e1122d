import { Module } from '@nestjs/common';
import { MailService } from './mail.service';

/** Outgoing e-mail through nodemailer. */
@Module({ providers: [MailService], exports: [MailService] })
export class MailModule {}
