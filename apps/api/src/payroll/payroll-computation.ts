import { Injectable, Logger, type BeforeApplicationShutdown } from '@nestjs/common';
import { computePay, DomainError, type PayResult } from '@tressury/domain';
import type { payrollLines } from '@tressury/schema';
import Big from 'big.js';
import { setImmediate as nextTick } from 'node:timers/promises';
import { Database } from '../database/database.js';
import { EventLog } from '../events/event-log.js';
import { PayrollRunComputed } from './events/payroll-run-computed.js';
import { PayCalendarRepository } from './pay-calendar.repository.js';
import { PayInputsReader, type StaffPayInput } from './pay-inputs.js';
import { PayrollRunsRepository } from './payroll-runs.repository.js';

// Staff per transaction: short transactions let other requests through on PGlite, which holds the
// whole database while one is open, and each one moves the progress counter.
const CHUNK = 100;
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

  constructor(
    private readonly database: Database,
    private readonly runs: PayrollRunsRepository,
    private readonly calendar: PayCalendarRepository,
    private readonly inputs: PayInputsReader,
    private readonly events: EventLog,
  ) {}

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
      const staffInputs = await this.inputs.forPeriod(organisationId, found.period, schedule);
      const withoutPlan = staffInputs.filter((s) => !s.planVersion).map((s) => s.staff.displayName);
      if (withoutPlan.length > 0) {
        throw new DomainError(
          'payroll_run.no_plan',
          `No pay plan is in effect on ${found.period.startDate} for ${withoutPlan.join(', ')}; assign one and run the period again.`,
          'conflict',
        );
      }
      await this.runs.updateRun(runId, { totalStaff: staffInputs.length });
      let grossPay = new Big(0);
      for (let i = 0; i < staffInputs.length; i += CHUNK) {
        const chunk = staffInputs.slice(i, i + CHUNK);
        const lines = chunk.map((s) => lineOf(organisationId, runId, s, computePay(s.input)));
        for (const line of lines) grossPay = grossPay.plus(line.grossPay);
        await this.database.transaction(async () => {
          await this.runs.insertLines(lines);
          await this.runs.updateRun(runId, { processedStaff: i + chunk.length, heartbeatAt: new Date() });
        });
        await nextTick();
      }
      await this.database.transaction(async () => {
        await this.runs.updateRun(runId, { status: 'draft', grossPay: grossPay.toFixed(2), completedAt: new Date() });
        await this.events.append(new PayrollRunComputed(organisationId, runId, null, { staff: staffInputs.length, grossPay: grossPay.toFixed(2) }));
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
