import type { AltitudeUnit, CanningMethod, GaugeType, JarSize, UnitSystem } from '@jarday/rules';
import type { RecipeData, Role } from '@jarday/contracts';
import { index, integer, primaryKey, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { users } from './users.js';

export const kitchens = sqliteTable('kitchens', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  /** Kept as entered, so a kitchen that works in metres sees metres again. */
  altitudeValue: real('altitude_value').notNull(),
  altitudeUnit: text('altitude_unit').$type<AltitudeUnit>().notNull(),
  units: text('units').$type<UnitSystem>().notNull(),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
});

export const memberships = sqliteTable(
  'memberships',
  {
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: text('role').$type<Role>().notNull(),
    /** E-mail reminders (bands may come off, a reprocess deadline nears); each member can turn them off. */
    reminders: integer('reminders', { mode: 'boolean' }).notNull().default(true),
    joinedAt: integer('joined_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.kitchenId, t.userId] }), index('memberships_user_idx').on(t.userId)],
);

export const invites = sqliteTable(
  'invites',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    /** 8 characters without the display dash. */
    code: text('code').notNull().unique(),
    role: text('role').$type<Exclude<Role, 'lead'>>().notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    redeemedBy: text('redeemed_by').references(() => users.id, { onDelete: 'set null' }),
    redeemedAt: integer('redeemed_at', { mode: 'timestamp_ms' }),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('invites_kitchen_idx').on(t.kitchenId)],
);

export const canners = sqliteTable(
  'canners',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    method: text('method').$type<CanningMethod>().notNull(),
    gauge: text('gauge').$type<GaugeType>(),
    capacity: text('capacity', { mode: 'json' }).$type<Partial<Record<JarSize, number>>>().notNull(),
    /** For the physics estimate of the come-up time when the kitchen has no logged come-ups yet. */
    waterLitres: real('water_litres'),
    burnerWatts: integer('burner_watts'),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('canners_kitchen_idx').on(t.kitchenId)],
);

/** A kitchen's recipe: the validated recipe document as JSON, its name beside it for sorting. */
export const recipes = sqliteTable(
  'recipes',
  {
    id: text('id').primaryKey(),
    kitchenId: text('kitchen_id')
      .notNull()
      .references(() => kitchens.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    data: text('data', { mode: 'json' }).$type<RecipeData>().notNull(),
    copiedFrom: text('copied_from'),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('recipes_kitchen_idx').on(t.kitchenId)],
);
