import { type AttachmentTarget, attachmentTargetSchema, type AttachmentView, idSchema } from '@jarday/contracts';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  Post,
  Query,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { AnyMember, CurrentMembership, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import type { MembershipRow } from '../kitchens/kitchens.repository.js';
import { contentDisposition } from './inspect-upload.js';
import { UploadErrorsInterceptor } from './upload-errors.interceptor.js';
import { type AttachmentStream, type IncomingFile, UploadsService } from './uploads.service.js';

/** Headers for sending stored bytes: the sniffed type, a safe name, and no second guessing by the browser. */
function send(res: Response, file: AttachmentStream, kind: 'inline' | 'attachment'): StreamableFile {
  res.setHeader('X-Content-Type-Options', 'nosniff');
  // A stored file is never a page: no scripts, no plugins, even if opened on its own.
  res.setHeader('Content-Security-Policy', "default-src 'none'; img-src 'self'; sandbox");
  res.setHeader('Cache-Control', 'private, max-age=3600');
  return new StreamableFile(file.stream, {
    type: file.mime,
    length: file.bytes,
    disposition: contentDisposition(kind, file.fileName),
  });
}

@ApiTags('attachments')
@ApiBearerAuth()
@Controller('kitchens/:kitchenId/attachments')
export class UploadsController {
  constructor(private readonly uploads: UploadsService) {}

  @Post()
  @KitchenRoles('lead', 'helper')
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(UploadErrorsInterceptor, FileInterceptor('file'))
  upload(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @Body({ schema: attachmentTargetSchema }) target: AttachmentTarget,
    @UploadedFile() file: IncomingFile | undefined,
  ): Promise<AttachmentView> {
    return this.uploads.upload(kitchenId, target, file, user.id);
  }

  @Get()
  @AnyMember()
  list(
    @Param('kitchenId') kitchenId: string,
    @Query({ schema: attachmentTargetSchema }) q: AttachmentTarget,
  ): AttachmentView[] {
    return this.uploads.list(kitchenId, q.subject, q.subjectId);
  }

  @Get(':attachmentId/file')
  @AnyMember()
  async file(
    @Param('kitchenId') kitchenId: string,
    @Param('attachmentId', { schema: idSchema }) id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const file = await this.uploads.open(kitchenId, id, 'file');
    return send(res, file, file.mime === 'application/pdf' ? 'attachment' : 'inline');
  }

  @Get(':attachmentId/thumb')
  @AnyMember()
  async thumb(
    @Param('kitchenId') kitchenId: string,
    @Param('attachmentId', { schema: idSchema }) id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    return send(res, await this.uploads.open(kitchenId, id, 'thumb'), 'inline');
  }

  @Delete(':attachmentId')
  @KitchenRoles('lead', 'helper')
  @HttpCode(204)
  remove(
    @Param('kitchenId') kitchenId: string,
    @Param('attachmentId', { schema: idSchema }) id: string,
    @CurrentUser() user: AuthUser,
    @CurrentMembership() membership: MembershipRow,
  ): Promise<void> {
    return this.uploads.remove(kitchenId, id, user.id, membership.role);
  }
}
