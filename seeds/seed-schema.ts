import { createCannerSchema, createKitchenSchema, emailSchema, passwordSchema, roleSchema } from '@jarday/contracts';
import { z } from 'zod';

/** The shape of a seed file: the same schemas that guard the REST edge guard the demo data. */
export const seedSchema = z.object({
  kitchen: createKitchenSchema,
  people: z
    .array(z.object({ email: emailSchema, password: passwordSchema, name: z.string().min(1), role: roleSchema }))
    .min(1)
    .refine((p) => p.some((x) => x.role === 'lead'), 'A seeded kitchen needs a lead'),
  canners: z.array(createCannerSchema),
  /** Starter recipes copied into the demo kitchen's Recipe box. */
  recipes: z.array(z.string().startsWith('starter-')).default([]),
});
export type Seed = z.infer<typeof seedSchema>;
