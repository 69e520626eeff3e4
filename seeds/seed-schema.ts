import { createCannerSchema, createKitchenSchema, emailSchema, passwordSchema, roleSchema } from '@jarday/contracts';
import { jarSizeSchema, packStyleSchema } from '@jarday/rules';
import { z } from 'zod';

const hoursAgo = z
  .number()
  .positive()
  .max(24 * 400);
const person = emailSchema;

/** One canner load of a past day, told by its times: the rest is the state machines' doing. */
const pastLoadSchema = z.strictObject({
  /** Index into the day's batches. */
  batch: z.int().min(0),
  canner: z.string().min(1),
  jars: z.int().min(1),
  /** Who ran the canner (their taps), and who answered the alarms. */
  by: person,
  ackBy: person,
  /** Lid on to the first full rolling boil. */
  comeUpMinutes: z.number().positive().max(120),
  /** The boil was lost this long after it was confirmed, and back this long later. */
  boilLost: z.strictObject({ afterMinutes: z.number().positive(), backAfterMinutes: z.number().positive() }).optional(),
  /** How long the "time is up" alarm rang before someone acknowledged it. */
  ackSeconds: z.int().min(1).max(3600),
  /** A lead's override of the 5-minute rest in the open canner, with the reason. */
  restOverride: z.strictObject({ by: person, minutes: z.int().min(1).max(4), reason: z.string().min(5) }).optional(),
  liftedHoursAgo: hoursAgo,
  /** Bands off and every jar checked 24 h after lifting: the jars that did not seal. */
  seals: z
    .strictObject({
      by: person,
      unsealed: z.array(z.int().min(1)).default([]),
      broken: z.array(z.int().min(1)).default([]),
    })
    .optional(),
});

const pastDaySchema = z.strictObject({
  title: z.string().min(1),
  openedHoursAgo: hoursAgo,
  closedHoursAgo: hoursAgo,
  openedBy: person,
  batches: z
    .array(
      z.strictObject({
        recipe: z.string().startsWith('starter-'),
        jarSize: jarSizeSchema,
        pack: packStyleSchema,
        jars: z.int().min(1),
      }),
    )
    .min(1),
  loads: z.array(pastLoadSchema).min(1),
  /** Pantry lots (one per batch, made at its first seal check) and what left the shelf. */
  lots: z
    .array(
      z.strictObject({
        batch: z.int().min(0),
        location: z.string().max(80).nullable(),
        entries: z.array(
          z.strictObject({
            kind: z.enum(['eaten', 'gift', 'spoiled']),
            jars: z.int().min(1),
            recipient: z.string().optional(),
            note: z.string().optional(),
            daysAfter: z.int().min(0),
            by: person,
          }),
        ),
      }),
    )
    .default([]),
});
export type PastDay = z.infer<typeof pastDaySchema>;
export type PastLoad = z.infer<typeof pastLoadSchema>;

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
  /** Past canning days, timed relative to the moment of seeding, oldest first. */
  history: z.array(pastDaySchema).default([]),
});
export type Seed = z.infer<typeof seedSchema>;
