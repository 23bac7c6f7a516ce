import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { deriveFigures, sumMoney } from '@tressury/domain';
import { checkRange, datesOf } from '../compare-range.js';
import { CompareRepository } from '../compare.repository.js';
import { hoursText, toCompareBranchView } from '../compare-views.js';
import type { BranchDayFiguresView, BranchDaysView } from '../dto/branch-days.view.js';
import { ListBranchDaysQuery } from './list-branch-days.query.js';

@QueryHandler(ListBranchDaysQuery)
export class ListBranchDaysHandler implements IQueryHandler<ListBranchDaysQuery> {
  constructor(private readonly compare: CompareRepository) {}

  async execute({ user, branchId, from, to }: ListBranchDaysQuery): Promise<BranchDaysView> {
    const branch = await this.compare.branch(user, branchId);
    checkRange(from, to);
    const range = { organisationId: user.organisationId, branchIds: [branch.id], from, to };
    const days = new Map((await this.compare.figures.branchDays(range)).map((d) => [d.date, d]));
    const clients = await this.compare.figures.clientsByDay(range);
    const money = (value: string | undefined) => sumMoney([value ?? '0']);
    const rows = datesOf(from, to).map((date): BranchDayFiguresView => {
      const day = days.get(date);
      const seen = clients.get(date) ?? { clients: 0, newClients: 0 };
      const sums = {
        serviceRevenue: money(day?.serviceRevenue),
        retailRevenue: money(day?.retailRevenue),
        tickets: day?.tickets ?? 0,
        colourServiceRevenue: money(day?.colourServiceRevenue),
        colourProductCost: money(day?.colourProductCost),
        hours: day?.hours ?? '0.000',
        revenueWithHours: money(day?.revenueWithHours),
        clients: seen.clients,
        rebookedClients: 0,
        commissionCost: null,
        commissionBase: null,
      };
      const derived = deriveFigures(sums);
      return {
        date,
        dayClosed: day?.dayClosed ?? false,
        serviceRevenue: sums.serviceRevenue,
        retailRevenue: sums.retailRevenue,
        tickets: sums.tickets,
        averageTicket: derived.averageTicket,
        colourServiceRevenue: sums.colourServiceRevenue,
        colourProductCost: sums.colourProductCost,
        colourCostShare: derived.colourCostShare,
        retailToServiceRatio: derived.retailToServiceRatio,
        stylistHours: hoursText(sums.hours),
        revenuePerStylistHour: derived.revenuePerStylistHour,
        newClients: seen.newClients,
        returningClients: seen.clients - seen.newClients,
        tips: money(day?.tips),
        voids: day?.voids ?? 0,
        refunds: day?.refunds ?? 0,
        refundedAmount: money(day?.refundedAmount),
      };
    });
    return { branch: toCompareBranchView(branch), from, to, rows };
  }
}
