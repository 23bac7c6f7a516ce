import { Injectable } from '@nestjs/common';
import { outboundMessages, type OutboundMessageRow } from '@tressury/schema';
import { desc, type SQL } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class OutboxRepository {
  constructor(private readonly database: Database) {}

  async insert(values: typeof outboundMessages.$inferInsert): Promise<OutboundMessageRow> {
    const [row] = await this.database.db.insert(outboundMessages).values(values).returning();
    return row!;
  }

  /** Newest first; `readable` is the caller's CASL filter. */
  async page(readable: SQL, limit: number, offset: number): Promise<OutboundMessageRow[]> {
    return this.database.db
      .select()
      .from(outboundMessages)
      .where(readable)
      .orderBy(desc(outboundMessages.createdAt), desc(outboundMessages.id))
      .limit(limit)
      .offset(offset);
  }
}
