/** Applies the committed migrations to the configured database (`npm run db:migrate`); the server also does this at boot. */
import { validateConfig } from '../apps/server/src/config/config.schema.js';
import { openDatabase } from '../apps/server/src/db/database.js';

const config = validateConfig(process.env);
openDatabase(config.databasePath).$client.close();
console.log(`Migrations applied to ${config.databasePath}`);
