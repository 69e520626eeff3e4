import { dirname, resolve } from 'node:path';
import { z } from 'zod';

const bool = z.stringbool({ error: 'must be true or false' });
const int = (min: number, max: number) =>
  z.coerce.number({ error: 'must be a whole number' }).int('must be a whole number').min(min).max(max);

/** Every setting the server reads, in one schema: the app refuses to boot when one is bad. */
export const configSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    PORT: int(1, 65535).default(3000),
    HOST: z.string().min(1).default('0.0.0.0'),
    DATABASE_PATH: z.string().min(1).default('./data/jarday.sqlite'),
    JWT_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
    ACCESS_TOKEN_TTL_SECONDS: int(30, 24 * 3600).default(900),
    REFRESH_TOKEN_TTL_DAYS: int(1, 365).default(30),
    SIGNIN_THROTTLE_LIMIT: int(1, 10_000).default(10),
    SIGNIN_THROTTLE_TTL_SECONDS: int(1, 3600).default(60),
    BODY_LIMIT_BYTES: int(1024, 50 * 1024 * 1024).default(100 * 1024),
    PUBLIC_URL: z.url({ error: 'must be a URL such as http://localhost:3000' }).optional(),
    SMTP_URL: z.url({ protocol: /^smtps?$/, error: 'must be a URL such as smtp://localhost:1025' }).optional(),
    MAIL_FROM: z.string().min(3).default('Jarday <no-reply@jarday.invalid>'),
    /** The in-process mail catcher: on by default in development and demo mode (not in tests) without SMTP_URL. */
    MAIL_CATCHER: bool.optional(),
    /** Its loopback port; 0 lets the system pick one. */
    MAIL_CATCHER_PORT: int(0, 65535).default(0),
    /** The longest the reminder scheduler sleeps between two looks at the data. */
    REMINDER_CHECK_SECONDS: int(1, 24 * 3600).default(300),
    STORAGE_DIR: z.string().min(1).optional(),
    UPLOAD_MAX_BYTES: int(1024, 100 * 1024 * 1024).default(10 * 1024 * 1024),
    WEB_DIST_PATH: z.string().min(1).optional(),
    DEMO_MODE: bool.default(false),
    DEMO_SEED_FILE: z.string().min(1).optional(),
  })
  .refine((c) => c.NODE_ENV !== 'production' || c.JWT_SECRET !== undefined, {
    message: 'is required in production (at least 32 characters)',
    path: ['JWT_SECRET'],
  })
  .refine((c) => !(c.SMTP_URL !== undefined && c.MAIL_CATCHER === true), {
    message: 'cannot be on while SMTP_URL is set: mail goes to one place',
    path: ['MAIL_CATCHER'],
  });

export type RawConfig = z.infer<typeof configSchema>;

export interface AppConfig extends RawConfig {
  /** Absolute path of the SQLite file. */
  databasePath: string;
  /** The folder that holds the database, the generated secret and uploads. */
  dataDir: string;
  storageDir: string;
  /** Whether the server starts its own loopback mail catcher and sends to it (no SMTP_URL; dev, demo or asked). */
  mailCatcher: boolean;
}

export class ConfigError extends Error {}

/**
 * Validates the environment. The message names each bad setting, so a typo stops the app
 * with a sentence a person can act on instead of a stack trace.
 */
export function validateConfig(env: Record<string, string | undefined>): AppConfig {
  const result = configSchema.safeParse(
    Object.fromEntries(Object.entries(env).filter(([, v]) => v !== undefined && v !== '')),
  );
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join('.') || '(settings)'}: ${i.message}`);
    throw new ConfigError(`Jarday cannot start: invalid settings\n${lines.join('\n')}`);
  }
  const c = result.data;
  const databasePath = resolve(c.DATABASE_PATH);
  const dataDir = dirname(databasePath);
  // Tests ask for the catcher by name, so a suite that never reads mail never opens a port for it.
  const mailCatcher =
    c.SMTP_URL === undefined &&
    (c.MAIL_CATCHER ?? (c.NODE_ENV === 'development' || (c.DEMO_MODE && c.NODE_ENV !== 'test')));
  return {
    ...c,
    databasePath,
    dataDir,
    storageDir: resolve(c.STORAGE_DIR ?? resolve(dataDir, 'uploads')),
    mailCatcher,
  };
}
