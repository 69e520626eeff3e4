import type { CaughtMailView } from '@jarday/contracts';
import { Controller, Get, NotFoundException, Req } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { MailService } from './mail.service.js';

const LOOPBACK = new Set(['127.0.0.1', '::1', '::ffff:127.0.0.1']);

/**
 * What the development and demo catcher received, newest first. It exists only while that catcher runs, and only
 * for requests from this machine: caught invites carry working links, and a demo server may face a network. Any
 * other request is answered 404, as for a route the server does not have.
 */
@ApiExcludeController()
@Controller('dev/mail')
export class DevMailController {
  constructor(private readonly mail: MailService) {}

  @Get()
  @Public()
  list(@Req() req: Request): CaughtMailView[] {
    const catcher = this.mail.catcher;
    if (!catcher || !LOOPBACK.has(req.ip ?? '')) throw new NotFoundException('Cannot GET /api/dev/mail');
    return catcher
      .messages()
      .reverse()
      .map(({ to, subject, text, links, at }) => ({ to, subject, text, links, at }));
  }
}
