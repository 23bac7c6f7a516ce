import { Controller, Get, Param, Query, Res, StreamableFile } from '@nestjs/common';
import { QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { COMPARE_DEFINITIONS } from './compare-definitions.js';
import { DEFAULT_REBOOKING_DAYS } from './compare-range.js';
import type { ExportedFile } from './compare-workbook.js';
import { BranchComparisonView } from './dto/branch-comparison.view.js';
import { BranchDaysView } from './dto/branch-days.view.js';
import { BranchStylistsView } from './dto/branch-stylists.view.js';
import { BranchTrendView } from './dto/branch-trend.view.js';
import { CompareDefinitionsView } from './dto/compare-definitions.view.js';
import { BranchComparisonQueryDto, CompareRangeDto } from './dto/compare-range.dto.js';
import { FeeMonthDto } from './dto/fee-month.dto.js';
import { FeeStatementsView } from './dto/fee-statements.view.js';
import { GetBranchComparisonQuery } from './queries/get-branch-comparison.query.js';
import { GetBranchTrendQuery } from './queries/get-branch-trend.query.js';
import { GetComparisonWorkbookQuery } from './queries/get-comparison-workbook.query.js';
import { GetFeeStatementWorkbookQuery } from './queries/get-fee-statement-workbook.query.js';
import { GetFeeStatementsQuery } from './queries/get-fee-statements.query.js';
import { ListBranchDaysQuery } from './queries/list-branch-days.query.js';
import { ListBranchStylistsQuery } from './queries/list-branch-stylists.query.js';

/** Branch comparison and franchise fees: owners and accountants see every branch, a manager their own (others 404). */
@ApiTags('compare')
@ApiBearerAuth()
@Controller('compare')
export class CompareController {
  constructor(private readonly queries: QueryBus) {}

  /** How every figure is counted, for tooltips and column headings. */
  @Get('definitions')
  @CheckPolicies('read', 'BranchFigures')
  definitions(): CompareDefinitionsView {
    return COMPARE_DEFINITIONS;
  }

  /** Each branch's figures over the range, and their totals. */
  @Get('branches')
  @CheckPolicies('read', 'BranchFigures')
  branches(@CurrentUser() user: AuthUser, @Query() query: BranchComparisonQueryDto): Promise<BranchComparisonView> {
    return this.queries.execute(new GetBranchComparisonQuery(user, query.from, query.to, query.rebookingDays ?? DEFAULT_REBOOKING_DAYS));
  }

  /** The comparison table as a workbook, with a sheet of definitions. */
  @Get('branches.xlsx')
  @CheckPolicies('read', 'BranchFigures')
  @ApiProduces('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
  async branchesWorkbook(@CurrentUser() user: AuthUser, @Query() query: BranchComparisonQueryDto, @Res({ passthrough: true }) response: Response): Promise<StreamableFile> {
    return send(response, await this.queries.execute(new GetComparisonWorkbookQuery(user, query.from, query.to, query.rebookingDays ?? DEFAULT_REBOOKING_DAYS)));
  }

  /** Each branch's sales, tickets, average ticket and colour cost share day by day. */
  @Get('trend')
  @CheckPolicies('read', 'BranchFigures')
  trend(@CurrentUser() user: AuthUser, @Query() query: CompareRangeDto): Promise<BranchTrendView> {
    return this.queries.execute(new GetBranchTrendQuery(user, query.from, query.to));
  }

  /** One branch's figures for every business date of the range. */
  @Get('branches/:branchId/days')
  @CheckPolicies('read', 'BranchFigures')
  days(@CurrentUser() user: AuthUser, @Param('branchId', ParseId('branchId')) branchId: string, @Query() query: CompareRangeDto): Promise<BranchDaysView> {
    return this.queries.execute(new ListBranchDaysQuery(user, branchId, query.from, query.to));
  }

  /** One branch's figures per staff member over the range. */
  @Get('branches/:branchId/stylists')
  @CheckPolicies('read', 'BranchFigures')
  stylists(@CurrentUser() user: AuthUser, @Param('branchId', ParseId('branchId')) branchId: string, @Query() query: CompareRangeDto): Promise<BranchStylistsView> {
    return this.queries.execute(new ListBranchStylistsQuery(user, branchId, query.from, query.to));
  }

  /** Each branch's franchise fees for the month: gross sales, rates and amounts. */
  @Get('fees')
  @CheckPolicies('read', 'BranchFigures')
  fees(@CurrentUser() user: AuthUser, @Query() query: FeeMonthDto): Promise<FeeStatementsView> {
    return this.queries.execute(new GetFeeStatementsQuery(user, query.month));
  }

  /** One branch's monthly fee statement as a workbook. */
  @Get('fees/:branchId.xlsx')
  @CheckPolicies('read', 'BranchFigures')
  @ApiProduces('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
  async feeWorkbook(
    @CurrentUser() user: AuthUser,
    @Param('branchId', ParseId('branchId')) branchId: string,
    @Query() query: FeeMonthDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return send(response, await this.queries.execute(new GetFeeStatementWorkbookQuery(user, branchId, query.month)));
  }
}

function send(response: Response, file: ExportedFile): StreamableFile {
  response.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`);
  return new StreamableFile(file.body, { type: file.contentType, length: file.body.length });
}
