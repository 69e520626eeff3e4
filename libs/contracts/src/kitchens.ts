import { altitudeSchema, canningMethodSchema, gaugeTypeSchema, jarSizeSchema, unitSystemSchema } from '@jarday/rules';
import type { Altitude, CanningMethod, GaugeType, JarSize, UnitSystem } from '@jarday/rules';
import { z } from 'zod';
import { emailSchema } from './auth.js';

export const ROLES = ['lead', 'helper', 'watcher'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const idSchema = z.uuid({ error: 'Must be an id' });

export const kitchenNameSchema = z
  .string({ error: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(80, 'Use at most 80 characters');

export const createKitchenSchema = z.strictObject({
  name: kitchenNameSchema,
  altitude: altitudeSchema.default({ value: 0, unit: 'ft' }),
  units: unitSystemSchema.default('us'),
});
export type CreateKitchenInput = z.input<typeof createKitchenSchema>;

export const updateKitchenSchema = z
  .strictObject({
    name: kitchenNameSchema.optional(),
    altitude: altitudeSchema.optional(),
    units: unitSystemSchema.optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateKitchenInput = z.infer<typeof updateKitchenSchema>;

export interface KitchenView {
  id: string;
  name: string;
  altitude: Altitude;
  units: UnitSystem;
  createdAt: string;
  /** The signed-in person's role in this kitchen. */
  role: Role;
  memberCount: number;
}

export interface MemberView {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export const updateMemberSchema = z.strictObject({ role: roleSchema });
export type UpdateMemberInput = z.infer<typeof updateMemberSchema>;

/* ---------- invites ---------- */

export const createInviteSchema = z.strictObject({
  role: roleSchema.exclude(['lead']).default('helper'),
  /** Days until the invite stops working. */
  expiresInDays: z.number().int().min(1).max(30).default(7),
  /** Where to e-mail the link; leave it out to share the code by hand. */
  email: emailSchema.optional(),
});
export type CreateInviteInput = z.input<typeof createInviteSchema>;

/** Short codes use an alphabet without look-alikes (no 0/O, 1/I/L): 8 characters shown as XXXX-XXXX. */
export const INVITE_CODE_ALPHABET = '23456789ABCDEFGHJKMNPQRSTUVWXYZ';
export const inviteCodeSchema = z
  .string({ error: 'Invite code is required' })
  .trim()
  .toUpperCase()
  .transform((s) => s.replace(/[\s-]/g, ''))
  .pipe(z.string().regex(new RegExp(`^[${INVITE_CODE_ALPHABET}]{8}$`), 'An invite code has 8 letters and digits'));

export interface InviteView {
  id: string;
  /** Displayed as XXXX-XXXX. */
  code: string;
  role: Exclude<Role, 'lead'>;
  createdAt: string;
  expiresAt: string;
  createdByName: string;
}

/** The answer to creating an invite: the invite, and where its link is being e-mailed. */
export interface CreatedInviteView extends InviteView {
  /** The address the link is on its way to; null when none was given or this server sends no mail. */
  emailedTo: string | null;
}

export interface InvitePreview {
  kitchenId: string;
  kitchenName: string;
  role: Exclude<Role, 'lead'>;
  expiresAt: string;
  /** True when the signed-in person already belongs to the kitchen. */
  alreadyMember: boolean;
}

/* ---------- canners ---------- */

export const cannerCapacitySchema = z
  .partialRecord(jarSizeSchema, z.number().int('Whole jars only').min(1, 'At least 1 jar').max(40, 'At most 40 jars'))
  .refine((c) => Object.keys(c).length > 0, { message: 'Give the capacity for at least one jar size' });

const cannerFields = {
  name: z.string({ error: 'Name is required' }).trim().min(1, 'Name is required').max(60, 'Use at most 60 characters'),
  method: canningMethodSchema,
  gauge: gaugeTypeSchema.nullable().default(null),
  capacity: cannerCapacitySchema,
  /** For the planner's come-up estimate when the canner has no logged days yet: water it holds with a load in. */
  waterLitres: z
    .number({ error: 'Water must be a number of litres' })
    .min(1, 'At least 1 L')
    .max(100, 'At most 100 L')
    .nullable()
    .default(null),
  /** The rated power of the burner or element it sits on, in watts. */
  burnerWatts: z
    .number({ error: 'Burner power must be a number of watts' })
    .int('Whole watts')
    .min(100, 'At least 100 W')
    .max(10_000, 'At most 10,000 W')
    .nullable()
    .default(null),
};

const gaugeMatchesMethod = (c: { method: CanningMethod; gauge: GaugeType | null }) =>
  c.method === 'pressure' ? c.gauge !== null : c.gauge === null;
const gaugeRule = {
  message: 'A pressure canner needs a gauge type (weighted or dial); a boiling-water canner has none',
  path: ['gauge'],
};

export const createCannerSchema = z.strictObject(cannerFields).refine(gaugeMatchesMethod, gaugeRule);
export type CreateCannerInput = z.input<typeof createCannerSchema>;

/** A canner is edited whole: the same body as create. */
export const updateCannerSchema = createCannerSchema;
export type UpdateCannerInput = CreateCannerInput;

export interface CannerView {
  id: string;
  kitchenId: string;
  name: string;
  method: CanningMethod;
  gauge: GaugeType | null;
  capacity: Partial<Record<JarSize, number>>;
  waterLitres: number | null;
  burnerWatts: number | null;
  createdAt: string;
}
