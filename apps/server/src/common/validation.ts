import { StandardSchemaValidationPipe } from '@nestjs/common';
import { AppError } from './app-error.js';

/** Turns Standard Schema (zod) issues into one 400 that names each bad field. */
export function createValidationPipe(): StandardSchemaValidationPipe {
  return new StandardSchemaValidationPipe({
    exceptionFactory: (issues) => {
      const list = issues.map((i) => ({
        path: (i.path ?? []).map((p) => (typeof p === 'object' ? String(p.key) : String(p))).join('.'),
        message: i.message,
      }));
      const summary = list.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; ');
      return new AppError('validation_failed', `Please check the form: ${summary}`, list);
    },
  });
}
