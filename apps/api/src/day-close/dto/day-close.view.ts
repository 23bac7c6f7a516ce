import { ApiProperty } from '@nestjs/swagger';
import type { DayCloseRow } from '@tressury/schema';

export class DayCloseView {
  id: string;
  branchId: string;
  businessDate: string;
  expectedCash: string;
  countedCash: string;
  /** Face value → count, when the drawer was counted by denomination. */
  @ApiProperty({ type: 'object', additionalProperties: { type: 'integer' }, nullable: true })
  cashDenominations: Record<string, number> | null;
  /** counted − expected: negative when the drawer is short. */
  cashVariance: string;
  cardTotalTickets: string;
  cardTotalProcessor: string;
  /** processor − tickets. */
  cardVariance: string;
  note: string;
  closedById: string;
  closedAt: string;
}

export const toDayCloseView = (row: DayCloseRow): DayCloseView => ({
  id: row.id,
  branchId: row.branchId,
  businessDate: row.businessDate,
  expectedCash: row.expectedCash,
  countedCash: row.countedCash,
  cashDenominations: (row.cashDenominations as Record<string, number> | null) ?? null,
  cashVariance: row.cashVariance,
  cardTotalTickets: row.cardTotalTickets,
  cardTotalProcessor: row.cardTotalProcessor,
  cardVariance: row.cardVariance,
  note: row.note,
  closedById: row.closedById,
  closedAt: row.closedAt.toISOString(),
});
