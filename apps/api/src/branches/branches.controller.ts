import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import { ParseId } from '../common/parse-id.pipe.js';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { CreateBranchCommand } from './commands/create-branch.command.js';
import { UpdateBranchCommand } from './commands/update-branch.command.js';
import { BranchView } from './dto/branch.view.js';
import { CreateBranchDto } from './dto/create-branch.dto.js';
import { UpdateBranchDto } from './dto/update-branch.dto.js';
import { GetBranchQuery } from './queries/get-branch.query.js';
import { ListBranchesQuery } from './queries/list-branches.query.js';

@ApiTags('branches')
@ApiBearerAuth()
@Controller('branches')
export class BranchesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The branches the caller may see, by name. */
  @Get()
  @CheckPolicies('read', 'Branch')
  list(@CurrentUser() user: AuthUser): Promise<BranchView[]> {
    return this.queries.execute(new ListBranchesQuery(user));
  }

  @Get(':id')
  @CheckPolicies('read', 'Branch')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<BranchView> {
    return this.queries.execute(new GetBranchQuery(user, id));
  }

  @Post()
  @CheckPolicies('create', 'Branch')
  create(@CurrentUser() user: AuthUser, @Body() body: CreateBranchDto): Promise<BranchView> {
    return this.commands.execute(new CreateBranchCommand(user, body));
  }

  /** Rename a branch or change its settings. */
  @Patch(':id')
  @CheckPolicies('update', 'Branch')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: UpdateBranchDto): Promise<BranchView> {
    return this.commands.execute(new UpdateBranchCommand(user, id, body));
  }
}
