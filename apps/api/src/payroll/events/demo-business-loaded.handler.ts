import { CommandBus, EventsHandler, type IEventHandler } from '@nestjs/cqrs';
import { userBranches, users } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import type { AuthUser } from '../../auth/auth-user.js';
import { Database } from '../../database/database.js';
import { DemoBusinessLoaded, type DemoPayrollScenario } from '../../events/demo-business-loaded.js';
import { ApprovePayrollRunCommand } from '../commands/approve-payroll-run.command.js';
import { ExportPayrollRunCommand } from '../commands/export-payroll-run.command.js';
import { StartPayrollRunCommand } from '../commands/start-payroll-run.command.js';

/**
 * Gives the demo business its payroll history: the accountant runs each finished pay period through the
 * same commands the web app sends (the real computation, CASL and events included), approves it, and
 * exports the older ones. The seeder's rows hold the plans, periods and hours.
 */
@EventsHandler(DemoBusinessLoaded)
export class DemoBusinessLoadedHandler implements IEventHandler<DemoBusinessLoaded> {
  constructor(
    private readonly database: Database,
    private readonly commands: CommandBus,
  ) {}

  handle(event: DemoBusinessLoaded): void {
    const scenario = event.payload.payroll;
    if (scenario) event.track(this.runHistory(event.organisationId, scenario));
  }

  private async runHistory(organisationId: string, scenario: DemoPayrollScenario): Promise<void> {
    const [accountant] = await this.database.db.select().from(users).where(eq(users.id, scenario.accountantId));
    if (!accountant || accountant.organisationId !== organisationId) throw new Error('The demo accountant is missing');
    const branches = await this.database.db.select({ id: userBranches.branchId }).from(userBranches).where(eq(userBranches.userId, accountant.id));
    const user: AuthUser = { id: accountant.id, organisationId, role: accountant.role, branchIds: branches.map((b) => b.id), staffId: accountant.staffId };
    const exported = new Set(scenario.exportPeriodIds);
    for (const periodId of scenario.approvePeriodIds) {
      const run = await this.commands.execute(new StartPayrollRunCommand(user, periodId, true));
      if (run.status !== 'draft') throw new Error(`The demo payroll run for ${run.startDate}–${run.endDate} did not finish: ${run.error ?? run.status}`);
      await this.commands.execute(new ApprovePayrollRunCommand(user, run.id));
      if (exported.has(periodId)) await this.commands.execute(new ExportPayrollRunCommand(user, run.id, 'csv'));
    }
  }
}
