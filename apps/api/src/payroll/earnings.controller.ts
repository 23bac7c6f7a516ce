import { Controller, Get } from '@nestjs/common';
import { QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { MyEarningsView } from './dto/my-earnings.view.js';
import { GetMyEarningsQuery } from './queries/get-my-earnings.query.js';

@ApiTags('payroll')
@ApiBearerAuth()
@Controller('payroll/earnings')
export class EarningsController {
  constructor(private readonly queries: QueryBus) {}

  /**
   * The caller's own pay period so far (closed days only), progress to the next commission tier, a per-day
   * series and past statements. 404 without a staff link; the rules on the caller's own pay figures apply.
   */
  @Get('me')
  me(@CurrentUser() user: AuthUser): Promise<MyEarningsView> {
    return this.queries.execute(new GetMyEarningsQuery(user, new Date()));
  }
}
