import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import type { ExportedFile } from '../commands/export-payroll-run.command.js';
import { STATEMENT_CONTENT_TYPE, statementFileName, writeStatementWorkbook } from '../pay-statement.js';
import { PayStatementsRepository } from '../pay-statements.repository.js';
import { payrollLineNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { GetPayStatementQuery } from './get-pay-statement.query.js';

/** One staff member's statement workbook, under the same read rules as their payroll line. */
@QueryHandler(GetPayStatementQuery)
export class GetPayStatementHandler implements IQueryHandler<GetPayStatementQuery> {
  constructor(
    private readonly runs: PayrollRunsRepository,
    private readonly statements: PayStatementsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId, lineId }: GetPayStatementQuery): Promise<ExportedFile> {
    const found = await this.runs.findLine(user.organisationId, runId, lineId);
    if (!found) throw payrollLineNotFound();
    const { line, runStatus } = found;
    const subject = { organisationId: line.organisationId, branchId: line.branchId, staffId: line.staffId, runStatus };
    assertCan(this.abilities.createFor(user), user.role, 'read', 'PayrollLine', subject, payrollLineNotFound);
    const run = await this.runs.findRun(user.organisationId, runId);
    const [organisationName, currencyOf] = await Promise.all([
      this.statements.organisationName(user.organisationId),
      this.statements.branchCurrencies(user.organisationId),
    ]);
    const statement = {
      organisationName,
      startDate: run!.period.startDate,
      endDate: run!.period.endDate,
      runStatus,
      currency: currencyOf.get(line.branchId) ?? '',
      line,
    };
    return { fileName: statementFileName(statement), contentType: STATEMENT_CONTENT_TYPE, body: await writeStatementWorkbook(statement) };
  }
}
