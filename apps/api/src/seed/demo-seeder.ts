import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { DEMO_PASSWORD, demoBusiness, generateDemoBusiness, generateDemoFoundation } from '@tressury/fixtures';
import {
  bowlComponents,
  bowls,
  branches,
  clients,
  dayCloses,
  levels,
  organisations,
  payments,
  payPeriods,
  payPlanAssignments,
  payPlans,
  payPlanVersions,
  paySchedules,
  products,
  retailLines,
  servicePrices,
  services,
  staff,
  ticketServiceLines,
  tickets,
  timesheetEntries,
  tips,
  userBranches,
  users,
} from '@tressury/schema';
import { getTableColumns, getTableName, sql } from 'drizzle-orm';
import type { PgTable } from 'drizzle-orm/pg-core';
import { performance } from 'node:perf_hooks';
import { hashPassword } from '../auth/passwords.js';
import type { AppConfig } from '../config.js';
import { Database } from '../database/database.js';
import { DemoBusinessLoaded } from '../events/demo-business-loaded.js';
import { EventLog } from '../events/event-log.js';
import { demoEndDates } from './demo-dates.js';

export type SeedMode = 'basic' | 'tickets' | 'full';

// One JSON parameter per chunk: 1000 rows keep each statement around a megabyte.
const CHUNK = 1000;
const PAYROLL_TABLES = ['paySchedule', 'payPeriods', 'payPlans', 'payPlanVersions', 'payPlanAssignments', 'timesheetEntries'];

/**
 * Loads the invented demo business into an empty database; a database with any organisation is left
 * alone. `full` is the whole business with its last 120 days of tickets, every day up to yesterday
 * closed, and its payroll: schedule, plans, hours, and the finished periods run and approved; `tickets`
 * the same without the payroll (for tests that set pay up themselves); `basic` only the organisation,
 * branches and sign-ins (the API tests build their own floor).
 */
@Injectable()
export class DemoSeeder implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoSeeder');

  constructor(
    private readonly database: Database,
    private readonly config: ConfigService<AppConfig, true>,
    private readonly events: EventLog,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    const mode = this.config.get('seedDemo', { infer: true });
    if (mode) await this.seedIfEmpty(mode);
  }

  async seedIfEmpty(mode: SeedMode = 'full'): Promise<boolean> {
    if (!(await this.isEmpty())) return false;
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const started = performance.now();
    const full = mode === 'basic' ? null : generateDemoBusiness(demoEndDates());
    const withPayroll = mode === 'full' ? full : null;
    const foundation = full ?? generateDemoFoundation({ createdAt: new Date() });
    const generated = performance.now();
    const organisationId = foundation.organisation.id;
    const seeded = await this.database.transaction(async () => {
      if (!(await this.isEmpty())) return null;
      await this.insert(organisations, [foundation.organisation]);
      await this.insert(branches, foundation.branches);
      if (full) {
        await this.insert(levels, full.levels);
        await this.insert(services, full.services);
        await this.insert(servicePrices, full.servicePrices);
        await this.insert(products, full.products);
        await this.insert(staff, full.staff);
      }
      await this.insert(
        users,
        foundation.users.map((user) => ({ ...user, passwordHash })),
      );
      await this.insert(userBranches, foundation.userBranches);
      if (full) {
        await this.insert(clients, full.clients);
        await this.insert(tickets, full.tickets);
        await this.insert(ticketServiceLines, full.serviceLines);
        await this.insert(bowls, full.bowls);
        await this.insert(bowlComponents, full.bowlComponents);
        await this.insert(retailLines, full.retailLines);
        await this.insert(tips, full.tips);
        await this.insert(payments, full.payments);
        await this.insert(dayCloses, full.dayCloses);
      }
      if (withPayroll) {
        await this.insert(paySchedules, [withPayroll.paySchedule]);
        await this.insert(payPeriods, withPayroll.payPeriods);
        await this.insert(payPlans, withPayroll.payPlans);
        await this.insert(payPlanVersions, withPayroll.payPlanVersions);
        await this.insert(payPlanAssignments, withPayroll.payPlanAssignments);
        await this.insert(timesheetEntries, withPayroll.timesheetEntries);
      }
      const counts = full
        ? Object.fromEntries(Object.entries(full.counts).filter(([table]) => withPayroll || !PAYROLL_TABLES.includes(table)))
        : { branches: foundation.branches.length, users: foundation.users.length };
      const event = new DemoBusinessLoaded(organisationId, organisationId, null, { mode, ...counts, ...(withPayroll ? { payroll: withPayroll.payroll } : {}) });
      await this.events.append(event);
      return event;
    });
    if (!seeded) return false;
    // Planner statistics for the bulk-loaded tables: without them (PGlite has no autovacuum) the first
    // queries over tens of thousands of rows take nested loops that run for seconds.
    await this.database.db.execute(sql`analyze`);
    const loaded = performance.now();
    // The payroll feature runs and approves the finished pay periods from the event.
    await seeded.settled().catch((error: unknown) => this.logger.error('The demo payroll history could not be completed', error instanceof Error ? error.stack : String(error)));
    const completed = performance.now();
    const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;
    const content = full
      ? `${full.counts.tickets} tickets and ${full.counts.dayCloses} closed days in ${full.counts.branches} branches` + (withPayroll ? `, ${withPayroll.counts.payPeriods} pay periods` : '')
      : `${foundation.branches.length} branches and ${foundation.users.length} sign-ins`;
    this.logger.log(
      `Loaded the demo business "${demoBusiness.organisationName}" (${mode}): ${content}; generated in ${seconds(generated - started)}, loaded in ${seconds(loaded - generated)}` +
        (withPayroll ? `, past payroll runs in ${seconds(completed - loaded)}` : ''),
    );
    return true;
  }

  private async isEmpty(): Promise<boolean> {
    const existing = await this.database.db.select({ id: organisations.id }).from(organisations).limit(1);
    return existing.length === 0;
  }

  /**
   * Inserts rows typed as the table's inserts, each chunk sent as one JSON parameter that PostgreSQL
   * unpacks with json_populate_recordset: about three times faster on PGlite than one bind parameter
   * per value. Columns a row leaves out take their defaults.
   */
  private async insert<T extends PgTable>(table: T, rows: T['$inferInsert'][]): Promise<void> {
    if (rows.length === 0) return;
    const columns = Object.entries(getTableColumns(table)).filter(([key]) => key in rows[0]!);
    const names = sql.join(
      columns.map(([, column]) => sql.identifier(column.name)),
      sql`, `,
    );
    for (let i = 0; i < rows.length; i += CHUNK) {
      const chunk = rows.slice(i, i + CHUNK).map((row) => Object.fromEntries(columns.map(([key, column]) => [column.name, (row as Record<string, unknown>)[key] ?? null])));
      await this.database.db.execute(
        sql`insert into ${table} (${names}) select ${names} from json_populate_recordset(null::${sql.identifier(getTableName(table))}, ${JSON.stringify(chunk)}::json)`,
      );
    }
  }
}
