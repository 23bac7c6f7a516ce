import { Injectable } from '@nestjs/common';
import { EventBus } from '@nestjs/cqrs';
import { domainEvents } from '@tressury/schema';
import { Database } from '../database/database.js';
import type { RecordableEvent } from './recordable-event.js';

@Injectable()
export class EventLog {
  constructor(
    private readonly database: Database,
    private readonly eventBus: EventBus,
  ) {}

  /** Appends the event in the current transaction and publishes it once that transaction commits. */
  async append(event: RecordableEvent): Promise<void> {
    if (!this.database.inTransaction) throw new Error(`${event.constructor.name} must be appended inside a transaction`);
    await this.database.db.insert(domainEvents).values({
      organisationId: event.organisationId,
      type: event.constructor.name,
      aggregateType: event.aggregateType,
      aggregateId: event.aggregateId,
      actorId: event.actorId,
      payload: event.payload,
    });
    this.database.afterCommit(() => this.eventBus.publish(event));
  }
}
