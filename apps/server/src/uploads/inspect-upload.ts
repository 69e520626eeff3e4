import { ATTACHMENT_MIME_TYPES } from '@jarday/contracts';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { AppError } from '../common/app-error.js';

export type AttachmentMime = (typeof ATTACHMENT_MIME_TYPES)[number];

const EXTENSIONS: Record<AttachmentMime, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'application/pdf': 'pdf',
};

/** Long edge of a thumbnail: sharp enough for a phone's list at 2x, a few kilobytes as WebP. */
export const THUMB_EDGE = 320;
/** A photo bigger than this many pixels is refused before it is decoded (a decompression bomb). */
const MAX_PIXELS = 60_000_000;

export interface InspectedUpload {
  mime: AttachmentMime;
  ext: string;
  width: number | null;
  height: number | null;
  /** A WebP thumbnail for images; PDFs have none. */
  thumb: Buffer | null;
}

const isAllowed = (mime: string): mime is AttachmentMime => (ATTACHMENT_MIME_TYPES as readonly string[]).includes(mime);

/**
 * Decides what a file is from its bytes (magic numbers via file-type), whatever its name or the browser says,
 * and makes the thumbnail of an image. A type we do not keep is a 415; an image that does not decode a 422.
 */
export async function inspectUpload(bytes: Buffer): Promise<InspectedUpload> {
  const sniffed = await fileTypeFromBuffer(bytes);
  if (!sniffed || !isAllowed(sniffed.mime)) {
    throw new AppError(
      'unsupported_file_type',
      `${sniffed ? `This file is really ${sniffed.ext.toUpperCase()}` : 'This file is not a photo or a PDF'}, whatever its name says: attach a JPEG, PNG or WebP photo, or a PDF`,
    );
  }
  const mime = sniffed.mime;
  if (mime === 'application/pdf') return { mime, ext: EXTENSIONS[mime], width: null, height: null, thumb: null };
  try {
    // rotate() applies the camera's orientation, so a phone photo's thumbnail stands the right way up.
    const image = sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: 'error' }).rotate();
    const meta = await image.metadata();
    const { data, info } = await image
      .clone()
      .resize(THUMB_EDGE, THUMB_EDGE, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 75 })
      .toBuffer({ resolveWithObject: true });
    const turned = (meta.orientation ?? 1) >= 5;
    const width = turned ? meta.height : meta.width;
    const height = turned ? meta.width : meta.height;
    if (!info.width || !width || !height) throw new Error('no size');
    return { mime, ext: EXTENSIONS[mime], width, height, thumb: data };
  } catch {
    throw new AppError(
      'unreadable_image',
      'This photo could not be read (it may be damaged or too large). Try another.',
    );
  }
}

/**
 * A file name that is safe to store and to send back: no folders, no control or quote characters, at most 100
 * characters, and the extension of what the file really is. The name is only shown; storage keys never use it.
 */
export function safeFileName(original: string | undefined, ext: string): string {
  const base = (original ?? '').split(/[/\\]/).pop() ?? '';
  const stem = base
    .replace(/\.[^.]*$/, '')
    .normalize('NFC')
    .replace(/[\p{C}"'`<>|:*?;]/gu, '')
    .replace(/\s+/g, ' ')
    .replace(/^[.\s-]+/, '')
    .trim()
    .slice(0, 100);
  return `${stem || 'attachment'}.${ext}`;
}

/** `Content-Disposition` with an ASCII fallback and the UTF-8 name (RFC 6266, RFC 5987). */
export function contentDisposition(kind: 'inline' | 'attachment', fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/[\\"%]/g, '_');
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}
