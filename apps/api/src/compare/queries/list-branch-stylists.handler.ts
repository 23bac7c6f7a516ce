import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { amountPer, sumMoney } from '@tressury/domain';
import { checkRange } from '../compare-range.js';
import { CompareRepository } from '../compare.repository.js';
import { hoursText, toCompareBranchView } from '../compare-views.js';
import type { BranchStylistsView } from '../dto/branch-stylists.view.js';
import { ListBranchStylistsQuery } from './list-branch-stylists.query.js';

@QueryHandler(ListBranchStylistsQuery)
export class ListBranchStylistsHandler implements IQueryHandler<ListBranchStylistsQuery> {
  constructor(private readonly compare: CompareRepository) {}

  async execute({ user, branchId, from, to }: ListBranchStylistsQuery): Promise<BranchStylistsView> {
    const branch = await this.compare.branch(user, branchId);
    checkRange(from, to);
    const rows = await this.compare.figures.staffSums({ organisationId: user.organisationId, branchIds: [branch.id], from, to });
    return {
      branch: toCompareBranchView(branch),
      from,
      to,
      rows: rows.map((row) => {
        const serviceRevenue = sumMoney([row.service_revenue]);
        const retailRevenue = sumMoney([row.retail_revenue]);
        return {
          staffId: row.staff_id,
          staffName: row.staff_name,
          serviceRevenue,
          colourServiceRevenue: sumMoney([row.colour_service_revenue]),
          colourProductCost: sumMoney([row.colour_product_cost]),
          retailRevenue,
          tickets: row.tickets,
          averageTicket: amountPer(sumMoney([serviceRevenue, retailRevenue]), String(row.tickets)),
          hours: hoursText(row.hours),
          revenuePerHour: amountPer(row.revenue_with_hours, row.hours),
          tips: sumMoney([row.tips]),
        };
      }),
    };
  }
}
