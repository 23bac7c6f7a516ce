import { type IQueryHandler, QueryBus, QueryHandler } from '@nestjs/cqrs';
import { CompareRepository } from '../compare.repository.js';
import { comparisonWorkbook, type ExportedFile } from '../compare-workbook.js';
import { GetBranchComparisonQuery } from './get-branch-comparison.query.js';
import { GetComparisonWorkbookQuery } from './get-comparison-workbook.query.js';

@QueryHandler(GetComparisonWorkbookQuery)
export class GetComparisonWorkbookHandler implements IQueryHandler<GetComparisonWorkbookQuery> {
  constructor(
    private readonly queries: QueryBus,
    private readonly compare: CompareRepository,
  ) {}

  async execute({ user, from, to, rebookingDays }: GetComparisonWorkbookQuery): Promise<ExportedFile> {
    const view = await this.queries.execute(new GetBranchComparisonQuery(user, from, to, rebookingDays));
    const currencies = new Set((await this.compare.visibleBranches(user)).map((b) => b.currency));
    return comparisonWorkbook({
      organisationName: await this.compare.organisationName(user.organisationId),
      currency: currencies.size === 1 ? [...currencies][0] : undefined,
      view,
    });
  }
}
