import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { amountPer, shareOf, sumMoney } from '@tressury/domain';
import { checkRange, datesOf } from '../compare-range.js';
import { CompareRepository } from '../compare.repository.js';
import type { BranchTrendView, TrendPointView } from '../dto/branch-trend.view.js';
import { GetBranchTrendQuery } from './get-branch-trend.query.js';

@QueryHandler(GetBranchTrendQuery)
export class GetBranchTrendHandler implements IQueryHandler<GetBranchTrendQuery> {
  constructor(private readonly compare: CompareRepository) {}

  async execute({ user, from, to }: GetBranchTrendQuery): Promise<BranchTrendView> {
    checkRange(from, to);
    const branches = await this.compare.visibleBranches(user);
    const days = await this.compare.figures.branchDays({ organisationId: user.organisationId, branchIds: branches.map((b) => b.id), from, to });
    const byKey = new Map(days.map((d) => [`${d.branchId}:${d.date}`, d]));
    const dates = datesOf(from, to);
    return {
      from,
      to,
      series: branches.map((branch) => ({
        branchId: branch.id,
        branchName: branch.name,
        points: dates.map((date): TrendPointView => {
          const day = byKey.get(`${branch.id}:${date}`);
          const serviceRevenue = sumMoney([day?.serviceRevenue ?? '0']);
          const retailRevenue = sumMoney([day?.retailRevenue ?? '0']);
          const tickets = day?.tickets ?? 0;
          return {
            date,
            serviceRevenue,
            retailRevenue,
            tickets,
            averageTicket: amountPer(sumMoney([serviceRevenue, retailRevenue]), String(tickets)),
            colourCostShare: day ? shareOf(day.colourProductCost, day.colourServiceRevenue) : null,
          };
        }),
      })),
    };
  }
}
