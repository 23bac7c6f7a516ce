import { Controller, Get, Query } from '@nestjs/common';
import { QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { PageQueryDto } from '../common/page-query.dto.js';
import { OutboundMessageView } from './dto/outbound-message.view.js';
import { ListOutboxQuery } from './queries/list-outbox.query.js';

@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail')
export class MailController {
  constructor(private readonly queries: QueryBus) {}

  /** Every e-mail the app sent or failed to send, newest first, a page at a time (owner, accountant). */
  @Get('outbox')
  @CheckPolicies('read', 'OutboundMessage')
  outbox(@CurrentUser() user: AuthUser, @Query() page: PageQueryDto): Promise<OutboundMessageView[]> {
    return this.queries.execute(new ListOutboxQuery(user, page));
  }
}
