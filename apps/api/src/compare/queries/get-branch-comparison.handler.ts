import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { checkRange } from '../compare-range.js';
import { CompareRepository } from '../compare.repository.js';
import { addSums, toFiguresView } from '../compare-views.js';
import type { BranchComparisonView } from '../dto/branch-comparison.view.js';
import { GetBranchComparisonQuery } from './get-branch-comparison.query.js';

@QueryHandler(GetBranchComparisonQuery)
export class GetBranchComparisonHandler implements IQueryHandler<GetBranchComparisonQuery> {
  constructor(private readonly compare: CompareRepository) {}

  async execute({ user, from, to, rebookingDays }: GetBranchComparisonQuery): Promise<BranchComparisonView> {
    checkRange(from, to);
    const branches = await this.compare.visibleBranches(user);
    const sums = await this.compare.figures.branchSums({ organisationId: user.organisationId, branchIds: branches.map((b) => b.id), from, to }, rebookingDays);
    const rows = branches.map((branch) => toFiguresView(branch, branch.name, sums.get(branch.id)!));
    return { from, to, rebookingDays, rows, totals: toFiguresView(null, 'All branches', addSums([...sums.values()])) };
  }
}
