import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { type PayrollLineDetailView, toPayrollLineDetailView } from '../dto/payroll-run.view.js';
import { payrollLineNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { GetPayrollLineQuery } from './get-payroll-line.query.js';

@QueryHandler(GetPayrollLineQuery)
export class GetPayrollLineHandler implements IQueryHandler<GetPayrollLineQuery> {
  constructor(
    private readonly runs: PayrollRunsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId, lineId }: GetPayrollLineQuery): Promise<PayrollLineDetailView> {
    const found = await this.runs.findLine(user.organisationId, runId, lineId);
    if (!found) throw payrollLineNotFound();
    const { line, runStatus } = found;
    const subject = { organisationId: line.organisationId, branchId: line.branchId, staffId: line.staffId, runStatus };
    assertCan(this.abilities.createFor(user), user.role, 'read', 'PayrollLine', subject, payrollLineNotFound);
    return toPayrollLineDetailView(line);
  }
}
