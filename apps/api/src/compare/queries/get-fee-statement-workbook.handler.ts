import { type IQueryHandler, QueryBus, QueryHandler } from '@nestjs/cqrs';
import { sumMoney } from '@tressury/domain';
import { CompareRepository } from '../compare.repository.js';
import { type ExportedFile, feeStatementWorkbook } from '../compare-workbook.js';
import { GetFeeStatementWorkbookQuery } from './get-fee-statement-workbook.query.js';
import { GetFeeStatementsQuery } from './get-fee-statements.query.js';

@QueryHandler(GetFeeStatementWorkbookQuery)
export class GetFeeStatementWorkbookHandler implements IQueryHandler<GetFeeStatementWorkbookQuery> {
  constructor(
    private readonly queries: QueryBus,
    private readonly compare: CompareRepository,
  ) {}

  async execute({ user, branchId, month }: GetFeeStatementWorkbookQuery): Promise<ExportedFile> {
    const branch = await this.compare.branch(user, branchId);
    const statements = await this.queries.execute(new GetFeeStatementsQuery(user, month, branch.id));
    const days = await this.compare.figures.branchDays({ organisationId: user.organisationId, branchIds: [branch.id], from: statements.from, to: statements.to });
    return feeStatementWorkbook({
      organisationName: await this.compare.organisationName(user.organisationId),
      currency: branch.currency,
      month,
      statement: statements.rows[0]!,
      days: days.map((d) => ({ date: d.date, serviceRevenue: d.serviceRevenue, retailRevenue: d.retailRevenue, grossSales: sumMoney([d.serviceRevenue, d.retailRevenue]) })),
    });
  }
}
