import { BadRequestException, NotFoundException } from '@nestjs/common';
import { describe, expect, it } from 'vitest';
import { AppError } from './app-error.js';
import { toErrorBody } from './all-exceptions.filter.js';

describe('toErrorBody', () => {
  it('keeps a domain error whole', () => {
    expect(toErrorBody(new AppError('last_lead', 'A kitchen needs a lead'))).toEqual({
      statusCode: 409,
      code: 'last_lead',
      message: 'A kitchen needs a lead',
    });
  });

  it('hides the details of an unexpected error', () => {
    const body = toErrorBody(new TypeError("Cannot read properties of undefined (reading 'secret')"));
    expect(body).toEqual({
      statusCode: 500,
      code: 'internal',
      message: expect.not.stringContaining('secret') as string,
    });
  });

  it('maps framework HTTP errors to codes', () => {
    expect(toErrorBody(new NotFoundException('Cannot GET /api/x'))).toMatchObject({
      statusCode: 404,
      code: 'not_found',
    });
    expect(toErrorBody(new BadRequestException('bad'))).toMatchObject({ statusCode: 400, code: 'validation_failed' });
  });
});
