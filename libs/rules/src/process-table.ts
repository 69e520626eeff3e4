import { z } from 'zod';
import { bandBoundsSchema, bandLabel, findBand, formatFeet, type AltitudeBand } from './altitude.js';
import { JAR_SIZE_LABELS, jarSizeSchema, type JarSize } from './jars.js';
import type { Altitude, CanningMethod } from './kitchen.js';

/** How jars are filled: hot food, or raw food covered with hot liquid (USDA Guide 1). */
export const PACK_STYLES = ['hot', 'raw'] as const;
export const packStyleSchema = z.enum(PACK_STYLES, { error: 'Pack style must be hot or raw' });
export type PackStyle = z.infer<typeof packStyleSchema>;

/** Longest process time accepted, in minutes; a guard against typing errors, above any published table. */
export const MAX_PROCESS_MINUTES = 300;

export const processMinutesSchema = z
  .number({ error: 'A process time must be a number of minutes' })
  .int('Process times are whole minutes')
  .positive('A process time must be more than 0 minutes')
  .max(MAX_PROCESS_MINUTES, `A process time must be at most ${MAX_PROCESS_MINUTES} minutes`);

const rowName = (r: { jarSize: JarSize; pack: PackStyle }) =>
  `${JAR_SIZE_LABELS[r.jarSize].toLowerCase()} jars, ${r.pack} pack`;

function noDuplicateRows(rows: { jarSize: JarSize; pack: PackStyle }[], ctx: z.RefinementCtx) {
  const seen = new Set<string>();
  rows.forEach((row, i) => {
    const key = `${row.jarSize}/${row.pack}`;
    if (seen.has(key)) {
      ctx.addIssue({ code: 'custom', path: ['rows', i], message: `More than one row for ${rowName(row)}` });
    }
    seen.add(key);
  });
}

/** A boiling-water row: one time for each altitude band of the table, lowest band first. */
export const boilingWaterRowSchema = z.strictObject({
  jarSize: jarSizeSchema,
  pack: packStyleSchema,
  minutes: z.array(processMinutesSchema, { error: 'Give the minutes as a list, one per altitude band' }),
});

/**
 * A boiling-water process table as the USDA Complete Guide to Home Canning prints it: altitude bands given by
 * inclusive upper bounds in feet, and for each jar size and pack style one time per band. There is no general
 * "add N minutes" rule (USDA Guide 1): each tested recipe carries its own table.
 */
export const boilingWaterTableSchema = z
  .strictObject({
    bands: bandBoundsSchema,
    rows: z.array(boilingWaterRowSchema).min(1, 'Give at least one jar size and pack style'),
  })
  .superRefine((table, ctx) => {
    noDuplicateRows(table.rows, ctx);
    table.rows.forEach((row, i) => {
      if (row.minutes.length !== table.bands.length) {
        ctx.addIssue({
          code: 'custom',
          path: ['rows', i, 'minutes'],
          message: `${rowName(row)} has ${row.minutes.length} times for ${table.bands.length} altitude bands; give one per band`,
        });
        return;
      }
      row.minutes.forEach((minutes, band) => {
        const lower = row.minutes[band - 1];
        if (lower !== undefined && minutes < lower) {
          ctx.addIssue({
            code: 'custom',
            path: ['rows', i, 'minutes', band],
            message: `${rowName(row)}: ${minutes} min at ${bandLabel(table.bands, band)} is shorter than ${lower} min lower down; times never fall as altitude rises`,
          });
        }
      });
    });
  });
export type BoilingWaterTable = z.infer<typeof boilingWaterTableSchema>;

/** A pressure row: minutes at the gauge pressure for the altitude (the pressure, not the time, rises with altitude). */
export const pressureRowSchema = z.strictObject({
  jarSize: jarSizeSchema,
  pack: packStyleSchema,
  minutes: processMinutesSchema,
});

/** A pressure process table: minutes per jar size and pack; pounds come from the standard gauge table. */
export const pressureTableSchema = z
  .strictObject({ rows: z.array(pressureRowSchema).min(1, 'Give at least one jar size and pack style') })
  .superRefine((table, ctx) => noDuplicateRows(table.rows, ctx));
export type PressureTable = z.infer<typeof pressureTableSchema>;

/** A recipe's processing: a boiling-water table, a pressure table, or both when both were tested. */
export const processingSchema = z
  .strictObject({
    boilingWater: boilingWaterTableSchema.optional(),
    pressure: pressureTableSchema.optional(),
  })
  .refine((p) => p.boilingWater !== undefined || p.pressure !== undefined, {
    message: 'Give a boiling-water table, a pressure table or both',
  });
export type Processing = z.infer<typeof processingSchema>;

/** The table for one canning method, or undefined when the recipe was not tested that way. */
export function tableForMethod(processing: Processing, method: CanningMethod) {
  return method === 'boiling-water' ? processing.boilingWater : processing.pressure;
}

/** Jar size and pack pairs a table has times for, e.g. "pint jars, hot pack". */
export function testedRows(processing: Processing, method: CanningMethod): { jarSize: JarSize; pack: PackStyle }[] {
  return (tableForMethod(processing, method)?.rows ?? []).map(({ jarSize, pack }) => ({ jarSize, pack }));
}

export type BoilingWaterLookup =
  | { ok: true; minutes: number; band: AltitudeBand }
  | { ok: false; reason: { code: 'no-tested-time' | 'altitude-beyond-table'; message: string } };

/** The boiling-water time for a jar size and pack at an altitude, read from the table. */
export function boilingWaterMinutes(
  table: BoilingWaterTable,
  jarSize: JarSize,
  pack: PackStyle,
  altitude: Altitude,
): BoilingWaterLookup {
  const row = table.rows.find((r) => r.jarSize === jarSize && r.pack === pack);
  if (row === undefined) {
    return {
      ok: false,
      reason: { code: 'no-tested-time', message: `No tested time for ${rowName({ jarSize, pack })}` },
    };
  }
  const band = findBand(table.bands, altitude);
  const minutes = band === null ? undefined : row.minutes[band.index];
  if (band === null || minutes === undefined) {
    const top = table.bands[table.bands.length - 1] ?? 0;
    return {
      ok: false,
      reason: {
        code: 'altitude-beyond-table',
        message: `This recipe's table stops at ${bandLabel(table.bands, table.bands.length - 1)}; there is no tested time above ${formatFeet(top)} ft`,
      },
    };
  }
  return { ok: true, minutes, band };
}

/** Human name of a jar size and pack pair, e.g. "quart jars, raw pack". */
export function describeRow(jarSize: JarSize, pack: PackStyle): string {
  return rowName({ jarSize, pack });
}
