import type { ApiErrorBody } from '@jarday/contracts';
import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import type { Response } from 'express';
import { AppError, type ErrorCode } from './app-error.js';

const CODE_BY_STATUS: Record<number, ErrorCode> = {
  400: 'validation_failed',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  429: 'too_many_attempts',
};

/** Errors raised by Express's body parser before Nest sees the request. */
interface BodyParserError {
  type?: string;
  status?: number;
}

function bodyParserError(cause: unknown): ApiErrorBody | undefined {
  const type = (cause as BodyParserError | undefined)?.type;
  if (type === 'entity.parse.failed') {
    return { statusCode: 400, code: 'bad_json', message: 'The request body is not valid JSON' };
  }
  if (type === 'entity.too.large') {
    return { statusCode: 413, code: 'payload_too_large', message: 'The request body is too large' };
  }
  return undefined;
}

/** Turns any error into a JSON body a person can read; stack traces stay in the server log. */
export function toErrorBody(error: unknown): ApiErrorBody {
  if (error instanceof AppError) {
    return {
      statusCode: error.status,
      code: error.code,
      message: error.message,
      ...(error.issues && { issues: error.issues }),
    };
  }
  if (error instanceof ThrottlerException) {
    return { statusCode: 429, code: 'too_many_attempts', message: 'Too many attempts. Wait a minute and try again.' };
  }
  const parserError = bodyParserError(error instanceof HttpException ? error.cause : error);
  if (parserError) return parserError;
  if (error instanceof HttpException) {
    const status = error.getStatus();
    const res = error.getResponse();
    const message =
      typeof res === 'object' && res !== null && 'message' in res && typeof res.message === 'string'
        ? res.message
        : error.message;
    return { statusCode: status, code: CODE_BY_STATUS[status] ?? (status >= 500 ? 'internal' : 'conflict'), message };
  }
  return { statusCode: 500, code: 'internal', message: 'Something went wrong on the server. It has been logged.' };
}

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(error: unknown, host: ArgumentsHost): void {
    const body = toErrorBody(error);
    if (body.statusCode >= 500)
      this.logger.error(error instanceof Error ? (error.stack ?? error.message) : String(error));
    const res = host.switchToHttp().getResponse<Response>();
    res.status(body.statusCode).json(body);
  }
}
