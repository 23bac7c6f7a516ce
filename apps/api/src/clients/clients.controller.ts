import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { CreateClientCommand } from './commands/create-client.command.js';
import { UpdateClientCommand } from './commands/update-client.command.js';
import { ClientDetailView, ClientPageView } from './dto/client.view.js';
import { CreateClientDto } from './dto/create-client.dto.js';
import { FormulaPageView } from './dto/formula.view.js';
import { ListClientsDto } from './dto/list-clients.dto.js';
import { PageQueryDto } from '../common/page-query.dto.js';
import { UpdateClientDto } from './dto/update-client.dto.js';
import { GetClientQuery } from './queries/get-client.query.js';
import { ListClientFormulasQuery } from './queries/list-client-formulas.query.js';
import { ListClientsQuery } from './queries/list-clients.query.js';

// The routes for one client carry no route-level check: a caller who may read no client at all gets
// the same 404 as for a client outside their scope, from the check on the loaded record.
@ApiTags('clients')
@ApiBearerAuth()
@Controller('clients')
export class ClientsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The clients the caller may see, by last name then first name, a page at a time. */
  @Get()
  @CheckPolicies('read', 'Client')
  list(@CurrentUser() user: AuthUser, @Query() filter: ListClientsDto): Promise<ClientPageView> {
    return this.queries.execute(new ListClientsQuery(user, filter));
  }

  /** A client, with whether their last patch test covers colour today at their home branch. */
  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<ClientDetailView> {
    return this.queries.execute(new GetClientQuery(user, id));
  }

  /** Every bowl mixed for the client, newest first; bowl costs only for owners, managers and accountants. */
  @Get(':id/formulas')
  formulas(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Query() page: PageQueryDto): Promise<FormulaPageView> {
    return this.queries.execute(new ListClientFormulasQuery(user, id, page));
  }

  @Post()
  @CheckPolicies('create', 'Client')
  create(@CurrentUser() user: AuthUser, @Body() body: CreateClientDto): Promise<ClientDetailView> {
    return this.commands.execute(new CreateClientCommand(user, body));
  }

  /** Change any of a client's details; only the fields sent change. */
  @Patch(':id')
  @CheckPolicies('update', 'Client')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: UpdateClientDto): Promise<ClientDetailView> {
    return this.commands.execute(new UpdateClientCommand(user, id, body));
  }
}
