import { Body, Controller, Delete, Get, HttpCode, Param, Post, Patch, Query } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { AddRetailLineCommand } from './commands/add-retail-line.command.js';
import { AddServiceLineCommand } from './commands/add-service-line.command.js';
import { AddTipCommand } from './commands/add-tip.command.js';
import { CloseTicketCommand } from './commands/close-ticket.command.js';
import { OpenTicketCommand } from './commands/open-ticket.command.js';
import { RecordBowlCommand } from './commands/record-bowl.command.js';
import { RefundTicketCommand } from './commands/refund-ticket.command.js';
import { RemoveBowlCommand } from './commands/remove-bowl.command.js';
import { RemoveRetailLineCommand } from './commands/remove-retail-line.command.js';
import { RemoveServiceLineCommand } from './commands/remove-service-line.command.js';
import { RemoveTipCommand } from './commands/remove-tip.command.js';
import { TakePaymentCommand } from './commands/take-payment.command.js';
import { UpdateServiceLineCommand } from './commands/update-service-line.command.js';
import { VoidTicketCommand } from './commands/void-ticket.command.js';
import { AddRetailLineDto } from './dto/add-retail-line.dto.js';
import { AddServiceLineDto } from './dto/add-service-line.dto.js';
import { AddTipDto } from './dto/add-tip.dto.js';
import { ListTicketsDto } from './dto/list-tickets.dto.js';
import { OpenTicketDto } from './dto/open-ticket.dto.js';
import { RecordBowlDto } from './dto/record-bowl.dto.js';
import { RefundTicketDto } from './dto/refund-ticket.dto.js';
import { TakePaymentDto } from './dto/take-payment.dto.js';
import { TicketSummaryView } from './dto/ticket-summary.view.js';
import { TicketView } from './dto/ticket.view.js';
import { UpdateServiceLineDto } from './dto/update-service-line.dto.js';
import { VoidTicketDto } from './dto/void-ticket.dto.js';
import { GetTicketQuery } from './queries/get-ticket.query.js';
import { ListTicketsQuery } from './queries/list-tickets.query.js';

@ApiTags('tickets')
@ApiBearerAuth()
@Controller('tickets')
export class TicketsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** A branch's tickets for one business date (today by default), by number. */
  @Get()
  @CheckPolicies('read', 'Ticket')
  list(@CurrentUser() user: AuthUser, @Query() query: ListTicketsDto): Promise<TicketSummaryView[]> {
    return this.queries.execute(new ListTicketsQuery(user, query.branchId, query.date));
  }

  @Get(':id')
  @CheckPolicies('read', 'Ticket')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<TicketView> {
    return this.queries.execute(new GetTicketQuery(user, id));
  }

  /** Opens a ticket on today's business date in the branch's time zone. */
  @Post()
  @CheckPolicies('create', 'Ticket')
  open(@CurrentUser() user: AuthUser, @Body() body: OpenTicketDto): Promise<TicketView> {
    return this.commands.execute(new OpenTicketCommand(user, body));
  }

  /** Adds a service at the stylist's level price. Colour without a current patch test answers 409 until acknowledged. */
  @Post(':id/service-lines')
  @CheckPolicies('update', 'Ticket')
  addServiceLine(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: AddServiceLineDto): Promise<TicketView> {
    return this.commands.execute(new AddServiceLineCommand(user, id, body));
  }

  @Patch(':id/service-lines/:lineId')
  @CheckPolicies('update', 'Ticket')
  updateServiceLine(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseId()) id: string,
    @Param('lineId', ParseId('lineId')) lineId: string,
    @Body() body: UpdateServiceLineDto,
  ): Promise<TicketView> {
    return this.commands.execute(new UpdateServiceLineCommand(user, id, body, lineId));
  }

  @Delete(':id/service-lines/:lineId')
  @CheckPolicies('update', 'Ticket')
  removeServiceLine(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Param('lineId', ParseId('lineId')) lineId: string): Promise<TicketView> {
    return this.commands.execute(new RemoveServiceLineCommand(user, id, lineId));
  }

  /** Records a weighed bowl on a colour service; its cost, ratio, developer strength and waste are computed. */
  @Post(':id/bowls')
  @CheckPolicies('update', 'Ticket')
  recordBowl(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: RecordBowlDto): Promise<TicketView> {
    return this.commands.execute(new RecordBowlCommand(user, id, body));
  }

  @Delete(':id/bowls/:bowlId')
  @CheckPolicies('update', 'Ticket')
  removeBowl(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Param('bowlId', ParseId('bowlId')) bowlId: string): Promise<TicketView> {
    return this.commands.execute(new RemoveBowlCommand(user, id, bowlId));
  }

  @Post(':id/retail-lines')
  @CheckPolicies('update', 'Ticket')
  addRetailLine(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: AddRetailLineDto): Promise<TicketView> {
    return this.commands.execute(new AddRetailLineCommand(user, id, body));
  }

  @Delete(':id/retail-lines/:lineId')
  @CheckPolicies('update', 'Ticket')
  removeRetailLine(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Param('lineId', ParseId('lineId')) lineId: string): Promise<TicketView> {
    return this.commands.execute(new RemoveRetailLineCommand(user, id, lineId));
  }

  @Post(':id/tips')
  @CheckPolicies('update', 'Ticket')
  addTip(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: AddTipDto): Promise<TicketView> {
    return this.commands.execute(new AddTipCommand(user, id, body));
  }

  @Delete(':id/tips/:tipId')
  @CheckPolicies('update', 'Ticket')
  removeTip(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Param('tipId', ParseId('tipId')) tipId: string): Promise<TicketView> {
    return this.commands.execute(new RemoveTipCommand(user, id, tipId));
  }

  /** Cash or card. Send the same idempotencyKey again after a timeout: the card is charged once. */
  @Post(':id/payments')
  @CheckPolicies('pay', 'Ticket')
  takePayment(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: TakePaymentDto): Promise<TicketView> {
    return this.commands.execute(new TakePaymentCommand(user, id, body));
  }

  /** Closes a fully paid ticket whose colour services all have bowls or a no-product reason. */
  @Post(':id/close')
  @HttpCode(200)
  @CheckPolicies('close', 'Ticket')
  close(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<TicketView> {
    return this.commands.execute(new CloseTicketCommand(user, id));
  }

  @Post(':id/void')
  @HttpCode(200)
  @CheckPolicies('void', 'Ticket')
  void(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: VoidTicketDto): Promise<TicketView> {
    return this.commands.execute(new VoidTicketCommand(user, id, body));
  }

  /** Refunds services and returned retail of a closed ticket, booked as negative lines on today's date. */
  @Post(':id/refunds')
  @CheckPolicies('refund', 'Ticket')
  refund(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: RefundTicketDto): Promise<TicketView> {
    return this.commands.execute(new RefundTicketCommand(user, id, body));
  }
}
