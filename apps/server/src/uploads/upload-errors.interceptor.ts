import {
  type CallHandler,
  type ExecutionContext,
  HttpException,
  Inject,
  Injectable,
  type NestInterceptor,
} from '@nestjs/common';
import { catchError, type Observable, throwError } from 'rxjs';
import { AppError } from '../common/app-error.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';

/** "10 MB", "1.5 MB", "800 KB": the limit in words a person reads. */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Number((bytes / (1024 * 1024)).toFixed(1))} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

/**
 * Bound outside FileInterceptor: turns multer's terse refusals ("File too large", "Unexpected field") into
 * sentences that say what to do. Our own AppErrors (validation, sniffing) pass through untouched.
 */
@Injectable()
export class UploadErrorsInterceptor implements NestInterceptor {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  intercept(_ctx: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) => {
        if (error instanceof AppError || !(error instanceof HttpException)) return throwError(() => error);
        const status = error.getStatus();
        if (status === 413) {
          const limit = formatBytes(this.config.UPLOAD_MAX_BYTES);
          return throwError(
            () => new AppError('file_too_large', `This file is too large: the limit is ${limit}. Try a smaller photo.`),
          );
        }
        if (status === 400 || status === 415) {
          return throwError(
            () =>
              new AppError(
                'validation_failed',
                `The upload was not understood (${error.message}): send one file in the form field "file"`,
                [{ path: 'file', message: error.message }],
              ),
          );
        }
        return throwError(() => error);
      }),
    );
  }
}
