import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { DemoAccount } from '@jarday/contracts';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { z } from 'zod';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';

/** seeds/demo-kitchen.json, the same depth from src/demo and dist/demo. */
const DEFAULT_SEED_FILE = fileURLToPath(new URL('../../../../seeds/demo-kitchen.json', import.meta.url));

const seedPeopleSchema = z.object({
  people: z.array(z.object({ email: z.string(), password: z.string(), name: z.string(), role: z.string() })),
});

/** In demo mode the sign-in page lists the invented demo accounts, read from the seed file. */
@Injectable()
export class DemoService {
  private readonly logger = new Logger('Demo');
  private cached: DemoAccount[] | undefined;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  accounts(): { demoMode: boolean; accounts: DemoAccount[] } {
    if (!this.config.DEMO_MODE) return { demoMode: false, accounts: [] };
    this.cached ??= this.load();
    return { demoMode: true, accounts: this.cached };
  }

  private load(): DemoAccount[] {
    const file = this.config.DEMO_SEED_FILE ?? DEFAULT_SEED_FILE;
    try {
      return seedPeopleSchema.parse(JSON.parse(readFileSync(file, 'utf8'))).people;
    } catch (error) {
      this.logger.warn(`Demo mode is on but ${file} could not be read: ${String(error)}`);
      return [];
    }
  }
}
