import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { feeStatement, sumMoney } from '@tressury/domain';
import Big from 'big.js';
import { FEE_NOTE } from '../compare-definitions.js';
import { monthRange } from '../compare-range.js';
import { CompareRepository } from '../compare.repository.js';
import type { FeeStatementRowView, FeeStatementsView } from '../dto/fee-statements.view.js';
import { GetFeeStatementsQuery } from './get-fee-statements.query.js';

// numeric(12,5) pads rates ("0.06000"); a rate reads better as entered.
const rateText = (value: string): string => new Big(value).toString();

@QueryHandler(GetFeeStatementsQuery)
export class GetFeeStatementsHandler implements IQueryHandler<GetFeeStatementsQuery> {
  constructor(private readonly compare: CompareRepository) {}

  async execute({ user, month, branchId }: GetFeeStatementsQuery): Promise<FeeStatementsView> {
    const { from, to } = monthRange(month);
    const branches = branchId ? [await this.compare.branch(user, branchId)] : await this.compare.visibleBranches(user);
    const gross = await this.compare.figures.grossSales({ organisationId: user.organisationId, branchIds: branches.map((b) => b.id), from, to });
    const rows: FeeStatementRowView[] = branches.map((branch) => {
      const grossSales = sumMoney([gross.get(branch.id) ?? '0']);
      const fees = feeStatement({ grossSales, royaltyRate: branch.royaltyRate, marketingFundRate: branch.marketingFundRate });
      return {
        branchId: branch.id,
        branchName: branch.name,
        grossSales,
        royaltyRate: rateText(branch.royaltyRate),
        royaltyAmount: fees.royaltyAmount,
        marketingFundRate: rateText(branch.marketingFundRate),
        marketingFundAmount: fees.marketingFundAmount,
        totalFees: fees.totalFees,
      };
    });
    const total = (pick: (row: FeeStatementRowView) => string) => sumMoney(rows.map(pick));
    return {
      month,
      from,
      to,
      rows,
      totals: {
        branchId: null,
        branchName: 'All branches',
        grossSales: total((r) => r.grossSales),
        royaltyRate: null,
        royaltyAmount: total((r) => r.royaltyAmount),
        marketingFundRate: null,
        marketingFundAmount: total((r) => r.marketingFundAmount),
        totalFees: total((r) => r.totalFees),
      },
      note: FEE_NOTE,
    };
  }
}
