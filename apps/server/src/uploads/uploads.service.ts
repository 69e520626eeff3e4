import { randomUUID } from 'node:crypto';
import type { ReadStream } from 'node:fs';
import type { AttachmentSubject, AttachmentView, Role } from '@jarday/contracts';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { AppError, forbidden, notFound } from '../common/app-error.js';
import { FILE_STORAGE, type FileStorage } from './file-storage.js';
import { type AttachmentMime, inspectUpload, safeFileName } from './inspect-upload.js';
import { type AttachmentWithName, UploadsRepository } from './uploads.repository.js';

/** What multer's memory storage hands over: the bytes never touch the disk before they are checked. */
export interface IncomingFile {
  originalname: string;
  buffer: Buffer;
  size: number;
}

export interface AttachmentStream {
  stream: ReadStream;
  bytes: number;
  mime: string;
  fileName: string;
}

const SUBJECT_NAMES: Record<AttachmentSubject, string> = { day: 'Day', load: 'Load', lot: 'Lot', recipe: 'Recipe' };

const toView = (a: AttachmentWithName): AttachmentView => ({
  id: a.id,
  subject: a.subject,
  subjectId: a.subjectId,
  fileName: a.fileName,
  mime: a.mime as AttachmentMime,
  bytes: a.bytes,
  width: a.width,
  height: a.height,
  hasThumb: a.thumbKey !== null,
  uploadedById: a.uploadedBy,
  uploadedByName: a.uploadedByName,
  createdAt: a.createdAt.toISOString(),
});

@Injectable()
export class UploadsService {
  private readonly logger = new Logger('Uploads');

  constructor(
    private readonly repo: UploadsRepository,
    @Inject(FILE_STORAGE) private readonly storage: FileStorage,
  ) {}

  /**
   * Checks the file by its content, writes it (and its thumbnail) to storage, then its row in a transaction.
   * Any failure after the first write removes what was written, so a refused upload leaves no row and no file.
   */
  async upload(
    kitchenId: string,
    target: { subject: AttachmentSubject; subjectId: string },
    file: IncomingFile | undefined,
    userId: string,
    now = new Date(),
  ): Promise<AttachmentView> {
    if (!file || file.size === 0) {
      throw new AppError('validation_failed', 'Choose a photo or a PDF to attach', [
        { path: 'file', message: 'Choose a file' },
      ]);
    }
    this.requireSubject(kitchenId, target.subject, target.subjectId);
    const inspected = await inspectUpload(file.buffer);
    const id = randomUUID();
    const storageKey = `${kitchenId}/${id}`;
    const thumbKey = inspected.thumb ? `${kitchenId}/${id}.thumb.webp` : null;
    const written: string[] = [];
    try {
      await this.storage.put(storageKey, file.buffer);
      written.push(storageKey);
      if (thumbKey && inspected.thumb) {
        await this.storage.put(thumbKey, inspected.thumb);
        written.push(thumbKey);
      }
      this.repo.transaction(() => {
        // Checked again inside the transaction: the subject may have been deleted while the file was written.
        this.requireSubject(kitchenId, target.subject, target.subjectId);
        this.repo.insert({
          id,
          kitchenId,
          subject: target.subject,
          subjectId: target.subjectId,
          fileName: safeFileName(file.originalname, inspected.ext),
          mime: inspected.mime,
          bytes: file.buffer.length,
          storageKey,
          thumbKey,
          width: inspected.width,
          height: inspected.height,
          uploadedBy: userId,
          createdAt: now,
        });
      });
    } catch (error) {
      await Promise.all(written.map((key) => this.storage.delete(key).catch(() => undefined)));
      throw error;
    }
    return toView(this.requireAttachment(kitchenId, id));
  }

  list(kitchenId: string, subject: AttachmentSubject, subjectId: string): AttachmentView[] {
    return this.repo.list(kitchenId, subject, subjectId).map(toView);
  }

  async open(kitchenId: string, id: string, which: 'file' | 'thumb'): Promise<AttachmentStream> {
    const a = this.requireAttachment(kitchenId, id);
    const key = which === 'file' ? a.storageKey : a.thumbKey;
    const found = key ? await this.storage.get(key) : undefined;
    if (!found) throw notFound(which === 'file' ? 'File' : 'Thumbnail');
    const mime = which === 'file' ? a.mime : 'image/webp';
    const fileName = which === 'file' ? a.fileName : a.fileName.replace(/\.[^.]+$/, '-thumb.webp');
    return { stream: found.stream, bytes: found.bytes, mime, fileName };
  }

  /** A lead may remove any attachment; others only their own. The row goes first, then the bytes. */
  async remove(kitchenId: string, id: string, userId: string, role: Role): Promise<void> {
    const a = this.requireAttachment(kitchenId, id);
    if (role !== 'lead' && a.uploadedBy !== userId) {
      throw forbidden('Only a lead or the person who added it can remove it');
    }
    if (!this.repo.delete(kitchenId, id)) throw notFound('Attachment');
    for (const key of [a.storageKey, a.thumbKey]) {
      if (!key) continue;
      // The row is gone, so the file is unreachable either way; a leftover is logged for the operator.
      await this.storage.delete(key).catch((e: unknown) => this.logger.warn(`Could not remove ${key}: ${String(e)}`));
    }
  }

  private requireSubject(kitchenId: string, subject: AttachmentSubject, subjectId: string): void {
    if (!this.repo.subjectExists(kitchenId, subject, subjectId)) throw notFound(SUBJECT_NAMES[subject]);
  }

  private requireAttachment(kitchenId: string, id: string): AttachmentWithName {
    const a = this.repo.find(kitchenId, id);
    if (!a) throw notFound('Attachment');
    return a;
  }
}
