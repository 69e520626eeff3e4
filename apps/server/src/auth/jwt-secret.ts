import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { Logger } from '@nestjs/common';
import type { AppConfig } from '../config/app-config.js';

/**
 * The JWT signing secret: the configured one, or in development and tests a random one generated once
 * and kept in the data folder, so sign-ins survive a restart. Production without a secret never gets
 * here: the settings schema refuses to boot.
 */
export function resolveJwtSecret(config: AppConfig): string {
  if (config.JWT_SECRET) return config.JWT_SECRET;
  const file = join(config.dataDir, 'jwt-secret');
  if (existsSync(file)) {
    const saved = readFileSync(file, 'utf8').trim();
    if (saved.length >= 32) return saved;
  }
  mkdirSync(config.dataDir, { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, secret + '\n', { mode: 0o600 });
  new Logger('Auth').log(`No JWT_SECRET set: generated one and kept it in ${file}`);
  return secret;
}
