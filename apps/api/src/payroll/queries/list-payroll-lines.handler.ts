import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { type PayrollLineView, toPayrollLineView } from '../dto/payroll-run.view.js';
import { payrollRunNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { readablePayrollLines } from '../readable-payroll-lines.js';
import { ListPayrollLinesQuery } from './list-payroll-lines.query.js';

@QueryHandler(ListPayrollLinesQuery)
export class ListPayrollLinesHandler implements IQueryHandler<ListPayrollLinesQuery> {
  constructor(
    private readonly runs: PayrollRunsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId }: ListPayrollLinesQuery): Promise<PayrollLineView[]> {
    const found = await this.runs.findRun(user.organisationId, runId);
    if (!found) throw payrollRunNotFound();
    // The list shows figures only: the stored inputs and results stay in the database until a line is opened.
    const rows = await this.runs.lineFigures(runId, readablePayrollLines(this.abilities.createFor(user)));
    return rows.map(toPayrollLineView);
  }
}
