import { type BeforeApplicationShutdown, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { EventBus } from '@nestjs/cqrs';
import { sql } from 'drizzle-orm';
import type { Subscription } from 'rxjs';
import { Database } from '../../database/database.js';
import type { RecordableEvent } from '../../events/recordable-event.js';
import { type BranchDayKey, rebuildProjections, recomputeProjections, rowsOf, ticketScope } from '../compare-projections.js';

type Scope = { keys: BranchDayKey[]; clientIds: string[] };

// Other features' events are recognised by the name they are stored under in domain_events: features talk
// through events, not imports.
const TICKET_EVENTS = new Set(['TicketClosed', 'TicketVoided', 'TicketRefunded']);

/**
 * Keeps the comparison's read models up to date: after an event that changes a branch's figures has been
 * committed, the branch-days (and clients) it touches are recomputed whole from the source tables. Work runs
 * one piece after another in this instance, and under advisory locks across instances.
 */
@Injectable()
export class CompareProjector implements OnModuleInit, OnModuleDestroy, OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('CompareProjector');
  private subscription: Subscription | null = null;
  private queue: Promise<void> = Promise.resolve();

  constructor(
    private readonly database: Database,
    private readonly eventBus: EventBus,
  ) {}

  onModuleInit(): void {
    this.subscription = this.eventBus.subscribe((event) => this.enqueue(() => this.project(event as RecordableEvent)));
  }

  onModuleDestroy(): void {
    this.subscription?.unsubscribe();
  }

  /** Builds the read models of any organisation that has none yet: a fresh demo seed, or data from before they existed. */
  async onApplicationBootstrap(): Promise<void> {
    const organisations = rowsOf<{ id: string }>(
      await this.database.db.execute(sql`select o.id from organisations o where not exists (select 1 from compare_rebuilds r where r.organisation_id = o.id)`),
    );
    for (const { id } of organisations) await this.enqueue(() => this.rebuild(id));
  }

  async beforeApplicationShutdown(): Promise<void> {
    await this.settled();
  }

  /** Resolves once every event received so far has been projected. */
  settled(): Promise<void> {
    return this.queue;
  }

  /** Rebuilds one organisation's read models from the source tables (the tool and the bootstrap use it). */
  rebuild(organisationId: string): Promise<void> {
    return this.database.transaction(() => rebuildProjections(this.database.db, organisationId));
  }

  private enqueue(work: () => Promise<void>): Promise<void> {
    this.queue = this.queue.then(work).catch((error: unknown) => {
      this.logger.error(`A read model of the comparison could not be updated; npm run projections:rebuild restores it`, error instanceof Error ? error.stack : String(error));
    });
    return this.queue;
  }

  private async project(event: RecordableEvent): Promise<void> {
    const scope = await this.scopeOf(event);
    if (!scope || (scope.keys.length === 0 && scope.clientIds.length === 0)) return;
    await this.database.transaction(async () => {
      const locks = [...scope.keys.map((k) => `compare:${k.branchId}:${k.businessDate}`), ...scope.clientIds.map((id) => `compare:client:${id}`)].sort();
      for (const lock of locks) await this.database.db.execute(sql`select pg_advisory_xact_lock(hashtext(${lock}))`);
      await recomputeProjections(this.database.db, scope);
    });
  }

  /** The branch-days and clients an event may have changed, or null for events that change no figures. */
  private async scopeOf(event: RecordableEvent): Promise<Scope | null> {
    const name = event.constructor.name;
    const db = this.database.db;
    if (TICKET_EVENTS.has(name)) return ticketScope(db, event.aggregateId);
    if (name === 'AdjustmentAdded') {
      return { keys: await this.keys(sql`select branch_id, booked_on::text as business_date from adjustments where id = ${event.aggregateId}`), clientIds: [] };
    }
    if (name === 'DayClosed') {
      return { keys: await this.keys(sql`select branch_id, business_date::text as business_date from day_closes where id = ${event.aggregateId}`), clientIds: [] };
    }
    if (name === 'TimesheetHoursSet') {
      return { keys: await this.keys(sql`select branch_id, work_date::text as business_date from timesheet_entries where id = ${event.aggregateId}`), clientIds: [] };
    }
    if (name === 'TimesheetImported') {
      const rows = (event.payload.rows ?? []) as { branchId: string; date: string }[];
      const unique = new Map(rows.map((r) => [`${r.branchId}:${r.date}`, { branchId: r.branchId, businessDate: r.date }]));
      return { keys: [...unique.values()], clientIds: [] };
    }
    return null;
  }

  private async keys(query: ReturnType<typeof sql>): Promise<BranchDayKey[]> {
    return rowsOf<{ branch_id: string; business_date: string }>(await this.database.db.execute(query)).map((r) => ({ branchId: r.branch_id, businessDate: r.business_date }));
  }
}
