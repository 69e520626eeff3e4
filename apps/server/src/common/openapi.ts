import { ApiBody } from '@nestjs/swagger';
import { z } from 'zod';

/** Documents a zod body schema in OpenAPI from the very schema that validates it. */
export const ApiZodBody = (schema: z.ZodType) =>
  ApiBody({ schema: z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as object });
