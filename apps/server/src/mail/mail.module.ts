import { Global, Module } from '@nestjs/common';
import { DevMailController } from './dev-mail.controller.js';
import { MailService } from './mail.service.js';

/** Outgoing mail for every module; the dev route answers only while the loopback catcher runs. */
@Global()
@Module({ controllers: [DevMailController], providers: [MailService], exports: [MailService] })
export class MailModule {}
