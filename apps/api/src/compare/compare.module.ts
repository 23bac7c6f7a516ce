import { Module } from '@nestjs/common';
import { CompareController } from './compare.controller.js';
import { CompareRepository } from './compare.repository.js';
import { CompareProjector } from './events/compare.projector.js';
import { GetBranchComparisonHandler } from './queries/get-branch-comparison.handler.js';
import { GetBranchTrendHandler } from './queries/get-branch-trend.handler.js';
import { GetComparisonWorkbookHandler } from './queries/get-comparison-workbook.handler.js';
import { GetFeeStatementWorkbookHandler } from './queries/get-fee-statement-workbook.handler.js';
import { GetFeeStatementsHandler } from './queries/get-fee-statements.handler.js';
import { ListBranchDaysHandler } from './queries/list-branch-days.handler.js';
import { ListBranchStylistsHandler } from './queries/list-branch-stylists.handler.js';

@Module({
  controllers: [CompareController],
  providers: [
    CompareRepository,
    CompareProjector,
    GetBranchComparisonHandler,
    GetBranchTrendHandler,
    ListBranchDaysHandler,
    ListBranchStylistsHandler,
    GetFeeStatementsHandler,
    GetComparisonWorkbookHandler,
    GetFeeStatementWorkbookHandler,
  ],
})
export class CompareModule {}
