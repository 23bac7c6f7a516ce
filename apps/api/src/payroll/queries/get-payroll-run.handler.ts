import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { type PayrollRunView, toPayrollRunView } from '../dto/payroll-run.view.js';
import { payrollRunNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { GetPayrollRunQuery } from './get-payroll-run.query.js';

@QueryHandler(GetPayrollRunQuery)
export class GetPayrollRunHandler implements IQueryHandler<GetPayrollRunQuery> {
  constructor(
    private readonly runs: PayrollRunsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId }: GetPayrollRunQuery): Promise<PayrollRunView> {
    const found = await this.runs.findRun(user.organisationId, runId);
    if (!found) throw payrollRunNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'PayrollRun', found.run, payrollRunNotFound);
    return toPayrollRunView(found.run, found.period);
  }
}
