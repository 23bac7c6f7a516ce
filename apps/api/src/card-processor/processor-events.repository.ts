import { Injectable } from '@nestjs/common';
import { processorEvents } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class ProcessorEventsRepository {
  constructor(private readonly database: Database) {}

  async seen(id: string): Promise<boolean> {
    const rows = await this.database.db.select({ id: processorEvents.id }).from(processorEvents).where(eq(processorEvents.id, id)).limit(1);
    return rows.length > 0;
  }

  /** False when the event was already recorded, including by a concurrent delivery of the same event. */
  async record(id: string, type: string): Promise<boolean> {
    const rows = await this.database.db.insert(processorEvents).values({ id, type }).onConflictDoNothing().returning({ id: processorEvents.id });
    return rows.length > 0;
  }
}
