import { Injectable, Logger, type BeforeApplicationShutdown } from '@nestjs/common';
import { computePay, DomainError, type PayResult } from '@tressury/domain';
import type { payrollLines } from '@tressury/schema';
import Big from 'big.js';
import { setImmediate as nextTick } from 'node:timers/promises';
import { ConfigService } from '@nestjs/config';
import { HeapBudget } from '../common/heap-budget.js';
import type { AppConfig } from '../config.js';
import { Database } from '../database/database.js';
import { EventLog } from '../events/event-log.js';
import { PayrollRunComputed } from './events/payroll-run-computed.js';
import { PayCalendarRepository } from './pay-calendar.repository.js';
import { PayInputsReader, type StaffPayInput } from './pay-inputs.js';
import { PayrollRunsRepository } from './payroll-runs.repository.js';

// Garbage a run may leave before it is collected between groups (a group of 200 leaves about 12 MB).
const HEAP_ALLOWANCE_MB = 16;
// Far inside STALLED_AFTER_MS: a run whose heartbeat is a minute old is taken for dead and may be replaced.
const HEARTBEAT_MS = 10_000;

/**
 * Works a payroll run through its staff after the request that started it has been answered: reads the
 * period's inputs, computes each staff member with computePay, stores input and result, and counts
 * progress on the run so the web app can poll it. Waits for runs in flight before the app shuts down.
 */
@Injectable()
export class PayrollComputation implements BeforeApplicationShutdown {
  private readonly logger = new Logger('PayrollComputation');
  private readonly inFlight = new Set<Promise<void>>();
  /**
   * Staff read, computed and stored at a time: the run holds one group's lines in memory, its short
   * transactions let other requests through on PGlite (which holds the whole database while one is open),
   * and each group moves the progress counter.
   */
  private readonly groupSize: number;

  constructor(
    private readonly database: Database,
    private readonly runs: PayrollRunsRepository,
    private readonly calendar: PayCalendarRepository,
    private readonly inputs: PayInputsReader,
    private readonly events: EventLog,
    config: ConfigService<AppConfig, true>,
  ) {
    this.groupSize = config.get('payrollGroupSize', { infer: true });
  }

  start(organisationId: string, runId: string): void {
    const work = this.compute(organisationId, runId).finally(() => this.inFlight.delete(work));
    this.inFlight.add(work);
  }

  async beforeApplicationShutdown(): Promise<void> {
    await Promise.allSettled([...this.inFlight]);
  }

  /** Computes the run to the end; a problem marks it failed with a reason a person can act on. */
  async compute(organisationId: string, runId: string): Promise<void> {
    // On a timer as well as per chunk: reading a large period's inputs comes before the first chunk.
    const heartbeat = setInterval(() => void this.runs.updateRun(runId, { heartbeatAt: new Date() }).catch(() => undefined), HEARTBEAT_MS);
    try {
      await nextTick();
      const found = await this.runs.findRun(organisationId, runId);
      const schedule = await this.calendar.schedule(organisationId);
      if (!found || !schedule) return;
      const scope = await this.inputs.scope(organisationId, found.period, schedule);
      const planned = scope.staff.filter((s) => scope.planOf.has(s.id));
      const unplanned = scope.staff.filter((s) => !scope.planOf.has(s.id));
      const withoutPlan: string[] = [];
      for (let i = 0; i < unplanned.length; i += this.groupSize) {
        for (const s of await this.inputs.inputsOf(scope, unplanned.slice(i, i + this.groupSize))) withoutPlan.push(s.staff.displayName);
      }
      if (withoutPlan.length > 0) {
        throw new DomainError(
          'payroll_run.no_plan',
          `No pay plan is in effect on ${found.period.startDate} for ${withoutPlan.join(', ')}; assign one and run the period again.`,
          'conflict',
        );
      }
      // Every planned staff member is read; those with no hours and no lines in the period get no line.
      await this.runs.updateRun(runId, { totalStaff: planned.length });
      const budget = new HeapBudget(HEAP_ALLOWANCE_MB);
      let grossPay = new Big(0);
      let computed = 0;
      for (let i = 0; i < planned.length; i += this.groupSize) {
        const group = planned.slice(i, i + this.groupSize);
        const lines = (await this.inputs.inputsOf(scope, group)).map((s) => lineOf(organisationId, runId, s, computePay(s.input)));
        for (const line of lines) grossPay = grossPay.plus(line.grossPay);
        computed += lines.length;
        await this.database.transaction(async () => {
          await this.runs.insertLines(lines);
          await this.runs.updateRun(runId, { processedStaff: i + group.length, heartbeatAt: new Date() });
        });
        budget.settle();
        await nextTick();
      }
      await this.database.transaction(async () => {
        await this.runs.updateRun(runId, { status: 'draft', totalStaff: computed, processedStaff: computed, grossPay: grossPay.toFixed(2), completedAt: new Date() });
        await this.events.append(new PayrollRunComputed(organisationId, runId, null, { staff: computed, grossPay: grossPay.toFixed(2) }));
      });
    } catch (error) {
      const reason = error instanceof DomainError ? error.message : 'The run stopped on an unexpected error; it has been logged. Run the period again.';
      if (!(error instanceof DomainError)) this.logger.error(`Payroll run ${runId} failed`, error instanceof Error ? error.stack : String(error));
      await this.runs.updateRun(runId, { status: 'failed', error: reason, completedAt: new Date() }).catch(() => undefined);
    } finally {
      clearInterval(heartbeat);
    }
  }
}

function lineOf(organisationId: string, runId: string, s: StaffPayInput, result: PayResult): typeof payrollLines.$inferInsert {
  return {
    runId,
    organisationId,
    staffId: s.staff.id,
    branchId: s.branch.id,
    staffName: s.staff.displayName,
    branchName: s.branch.name,
    planVersionId: s.planVersion!.id,
    input: s.input,
    result,
    hours: s.input.hours.reduce((total, h) => total.plus(h.hours), new Big(0)).toFixed(3),
    serviceRevenue: result.serviceRevenue,
    productCharge: result.productCharge,
    commissionableRevenue: result.commissionableRevenue,
    serviceCommission: result.serviceCommission,
    retailCommission: result.retailCommission,
    hourlyPay: result.hourlyPay,
    tips: result.tips,
    minimumWageTopUp: result.minimumWageTopUp,
    overtimePremium: result.overtimePremium,
    grossPay: result.grossPay,
  };
}
