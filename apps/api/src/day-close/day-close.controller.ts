import { Body, Controller, Get, Post, Query } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { AddAdjustmentCommand } from './commands/add-adjustment.command.js';
import { CloseDayCommand } from './commands/close-day.command.js';
import { AddAdjustmentDto } from './dto/add-adjustment.dto.js';
import { CloseDayDto } from './dto/close-day.dto.js';
import { AdjustmentView, DayPreviewView } from './dto/day-preview.view.js';
import { DayQueryDto } from './dto/day-query.dto.js';
import { GetDayPreviewQuery } from './queries/get-day-preview.query.js';

@ApiTags('day close')
@ApiBearerAuth()
@Controller('day-close')
export class DayCloseController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The checklist and figures of one branch day, with the close once it is done. */
  @Get()
  @CheckPolicies('read', 'DayClose')
  preview(@CurrentUser() user: AuthUser, @Query() query: DayQueryDto): Promise<DayPreviewView> {
    return this.queries.execute(new GetDayPreviewQuery(user, query.branchId, query.businessDate));
  }

  /** Closes the day: records the count and the card totals, then locks the day's tickets. */
  @Post()
  @CheckPolicies('create', 'DayClose')
  close(@CurrentUser() user: AuthUser, @Body() body: CloseDayDto): Promise<DayPreviewView> {
    return this.commands.execute(new CloseDayCommand(user, body));
  }

  /** Books a correction to a closed day on today's open business date. */
  @Post('adjustments')
  @CheckPolicies('create', 'DayClose')
  addAdjustment(@CurrentUser() user: AuthUser, @Body() body: AddAdjustmentDto): Promise<AdjustmentView> {
    return this.commands.execute(new AddAdjustmentCommand(user, body));
  }
}
