import { type JarRecordView, idSchema, labelsQuerySchema } from '@jarday/contracts';
import { Controller, Get, Headers, Inject, Param, Query, Req, Res, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { z } from 'zod';
import { Public } from '../auth/auth.decorators.js';
import { TokensService } from '../auth/tokens.service.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { AnyMember } from '../kitchens/kitchen-role.guard.js';
import { LabelsService } from './labels.service.js';

export const jarRefSchema = z.string().min(16, 'Not a jar record').max(80, 'Not a jar record');

@ApiTags('labels')
@Controller()
export class LabelsController {
  constructor(
    private readonly labels: LabelsService,
    private readonly tokens: TokensService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** The address QR codes point at: PUBLIC_URL when set (it should be, behind a proxy), else the request's. */
  private origin(req: Request): string {
    return (this.config.PUBLIC_URL ?? `${req.protocol}://${req.get('host') ?? 'localhost'}`).replace(/\/+$/, '');
  }

  @Get('kitchens/:kitchenId/lots/:lotId/labels.pdf')
  @ApiBearerAuth()
  @AnyMember()
  @ApiProduces('application/pdf')
  async labelsPdf(
    @Param('kitchenId') kitchenId: string,
    @Param('lotId', { schema: idSchema }) lotId: string,
    @Query({ schema: labelsQuerySchema }) query: z.output<typeof labelsQuerySchema>,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const pdf = await this.labels.labelsPdf(kitchenId, lotId, query.sheet, this.origin(req));
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('Cache-Control', 'private, no-store');
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      length: pdf.length,
      disposition: `inline; filename="jar-labels-${query.sheet}.pdf"`,
    });
  }

  /** Open to anyone with the label; a member's bearer token (optional) adds the kitchen's links. */
  @Get('records/:ref')
  @Public()
  async record(
    @Param('ref', { schema: jarRefSchema }) ref: string,
    @Headers('authorization') authorization: string | undefined,
    @Res({ passthrough: true }) res: Response,
  ): Promise<JarRecordView> {
    const token = authorization?.startsWith('Bearer ') ? authorization.slice(7).trim() : undefined;
    const viewer = token ? await this.tokens.verifyAccess(token) : undefined;
    res.setHeader('Cache-Control', 'private, no-store');
    return this.labels.record(ref, viewer?.id);
  }
}
