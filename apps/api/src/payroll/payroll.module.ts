import { Module } from '@nestjs/common';
import { AddPayPlanVersionHandler } from './commands/add-pay-plan-version.handler.js';
import { ApprovePayrollRunHandler } from './commands/approve-payroll-run.handler.js';
import { AssignPayPlanHandler } from './commands/assign-pay-plan.handler.js';
import { CreatePayPeriodHandler } from './commands/create-pay-period.handler.js';
import { CreatePayPlanHandler } from './commands/create-pay-plan.handler.js';
import { ExportPayrollRunHandler } from './commands/export-payroll-run.handler.js';
import { ImportTimesheetHandler } from './commands/import-timesheet.handler.js';
import { SetPayScheduleHandler } from './commands/set-pay-schedule.handler.js';
import { SendPayStatementsHandler } from './commands/send-pay-statements.handler.js';
import { SetTimesheetHoursHandler } from './commands/set-timesheet-hours.handler.js';
import { StartPayrollRunHandler } from './commands/start-payroll-run.handler.js';
import { DemoBusinessLoadedHandler } from './events/demo-business-loaded.handler.js';
import { InterruptedRuns } from './interrupted-runs.js';
import { EarningsController } from './earnings.controller.js';
import { PayCalendarController } from './pay-calendar.controller.js';
import { PayCalendarRepository } from './pay-calendar.repository.js';
import { PayInputsReader } from './pay-inputs.js';
import { PayPlansController } from './pay-plans.controller.js';
import { PayPlansRepository } from './pay-plans.repository.js';
import { PayStatementsRepository } from './pay-statements.repository.js';
import { PayrollComputation } from './payroll-computation.js';
import { PayrollRunsController } from './payroll-runs.controller.js';
import { PayrollRunsRepository } from './payroll-runs.repository.js';
import { GetPayPlanHandler } from './queries/get-pay-plan.handler.js';
import { GetPayStatementHandler } from './queries/get-pay-statement.handler.js';
import { GetMyEarningsHandler } from './queries/get-my-earnings.handler.js';
import { GetPayrollLineHandler } from './queries/get-payroll-line.handler.js';
import { GetPayrollRunHandler } from './queries/get-payroll-run.handler.js';
import { ListPayPeriodsHandler } from './queries/list-pay-periods.handler.js';
import { ListPayPlansHandler } from './queries/list-pay-plans.handler.js';
import { ListPayrollLinesHandler } from './queries/list-payroll-lines.handler.js';
import { ListTimesheetEntriesHandler } from './queries/list-timesheet-entries.handler.js';
import { TimesheetsController } from './timesheets.controller.js';
import { TimesheetsRepository } from './timesheets.repository.js';

@Module({
  controllers: [PayPlansController, PayCalendarController, TimesheetsController, PayrollRunsController, EarningsController],
  providers: [
    PayPlansRepository,
    PayCalendarRepository,
    TimesheetsRepository,
    PayrollRunsRepository,
    PayInputsReader,
    PayrollComputation,
    InterruptedRuns,
    DemoBusinessLoadedHandler,
    CreatePayPlanHandler,
    AddPayPlanVersionHandler,
    AssignPayPlanHandler,
    SetPayScheduleHandler,
    CreatePayPeriodHandler,
    SetTimesheetHoursHandler,
    ImportTimesheetHandler,
    StartPayrollRunHandler,
    ApprovePayrollRunHandler,
    ExportPayrollRunHandler,
    ListPayPlansHandler,
    GetPayPlanHandler,
    ListPayPeriodsHandler,
    ListTimesheetEntriesHandler,
    GetPayrollRunHandler,
    ListPayrollLinesHandler,
    GetPayrollLineHandler,
    PayStatementsRepository,
    SendPayStatementsHandler,
    GetPayStatementHandler,
    GetMyEarningsHandler,
  ],
})
export class PayrollModule {}
