import { Injectable } from '@nestjs/common';
import type { BranchRow } from '@tressury/schema';
import { CardProcessor } from '../card-processor/card-processor.js';
import { businessDayBounds } from '../common/business-date.js';
import { DayCloseRepository } from './day-close.repository.js';
import { type DayPreviewView } from './dto/day-preview.view.js';
import { toDayCloseView } from './dto/day-close.view.js';
import { DayFiguresQuery } from './day-figures.js';

/** Builds a branch day's preview: the figures from our tables and the card processor's own total. */
@Injectable()
export class DayPreview {
  constructor(
    private readonly figures: DayFiguresQuery,
    private readonly closes: DayCloseRepository,
    private readonly processor: CardProcessor,
  ) {}

  /** Asks the card processor; call outside any transaction. */
  async processorTotal(branch: BranchRow, businessDate: string): Promise<string> {
    const { from, to } = businessDayBounds(branch.timeZone, businessDate);
    return this.processor.cardTotalBetween({ from, to, currency: branch.currency, metadata: { branchId: branch.id } });
  }

  /** A closed day shows the processor total stored at its close; an open day asks the processor (outside any transaction). */
  async build(branch: BranchRow, businessDate: string): Promise<DayPreviewView> {
    const figures = await this.figures.forDay(branch.id, businessDate);
    const close = await this.closes.find(branch.id, businessDate);
    const cardTotalProcessor = close ? close.cardTotalProcessor : await this.processorTotal(branch, businessDate);
    return {
      branchId: branch.id,
      branchName: branch.name,
      businessDate,
      close: close ? toDayCloseView(close) : null,
      ...figures,
      cardTotalProcessor,
      varianceNoteThreshold: branch.varianceNoteThreshold,
      readyToClose: !close && figures.ticketsByStatus.open === 0 && figures.pendingCardPayments === 0,
    };
  }
}
