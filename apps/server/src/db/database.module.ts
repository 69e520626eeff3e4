import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { openDatabase, type Db } from './database.js';

export const DB = Symbol('DB');
export const InjectDb = () => Inject(DB);

@Global()
@Module({
  providers: [
    { provide: DB, inject: [APP_CONFIG], useFactory: (config: AppConfig) => openDatabase(config.databasePath) },
  ],
  exports: [DB],
})
export class DatabaseModule implements OnApplicationShutdown {
  constructor(@InjectDb() private readonly db: Db) {}

  onApplicationShutdown(): void {
    if (this.db.$client.open) this.db.$client.close();
  }
}
