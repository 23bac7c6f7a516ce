import type { RecordableEvent } from './recordable-event.js';

/** Runs the demo's payroll history: every listed period run and approved by the accountant, some also exported. */
export type DemoPayrollScenario = { accountantId: string; approvePeriodIds: string[]; exportPeriodIds: string[] };

export type DemoBusinessLoadedPayload = { mode: 'basic' | 'tickets' | 'full'; payroll?: DemoPayrollScenario } & Record<string, unknown>;

/**
 * The demo business was loaded into an empty database. Here rather than in the seed feature because other
 * features finish the demo from it (payroll computes its past runs), and features never import each other.
 * A handler passes the work it starts to `track`, so the seeder returns only once the demo is whole.
 */
export class DemoBusinessLoaded implements RecordableEvent {
  readonly aggregateType = 'Organisation';
  private readonly work: Promise<unknown>[] = [];

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string | null,
    readonly payload: DemoBusinessLoadedPayload,
  ) {}

  track(work: Promise<unknown>): void {
    this.work.push(work);
  }

  /** Waits for the work handlers tracked; the first failure is thrown. */
  async settled(): Promise<void> {
    await Promise.all(this.work);
  }
}
