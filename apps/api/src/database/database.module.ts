import { Global, Inject, Injectable, Logger, Module, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from '../config.js';
import { Database } from './database.js';
import { openDatabase, type OpenedDatabase } from './open-database.js';

const OPENED_DATABASE = Symbol('OPENED_DATABASE');

@Injectable()
class DatabaseLifecycle implements OnApplicationShutdown {
  private readonly logger = new Logger('Database');
  private readonly timer: NodeJS.Timeout | null;

  constructor(@Inject(OPENED_DATABASE) private readonly opened: OpenedDatabase, config: ConfigService<AppConfig, true>) {
    // PGlite does not checkpoint by itself; a WAL left unflushed can stop the next start.
    this.timer =
      opened.database.engine === 'pglite'
        ? setInterval(() => {
            opened.checkpoint().catch((error: unknown) => this.logger.error(`checkpoint failed: ${String(error)}`));
          }, config.get('checkpointMinutes', { infer: true }) * 60_000).unref()
        : null;
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    await this.opened.close();
  }
}

@Global()
@Module({
  providers: [
    {
      provide: OPENED_DATABASE,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) =>
        openDatabase({ databaseUrl: config.get('databaseUrl', { infer: true }), dataDir: config.get('dataDir', { infer: true }) }),
    },
    { provide: Database, inject: [OPENED_DATABASE], useFactory: (opened: OpenedDatabase) => opened.database },
    DatabaseLifecycle,
  ],
  exports: [Database],
})
export class DatabaseModule {}
