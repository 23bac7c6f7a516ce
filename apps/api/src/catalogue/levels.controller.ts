import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { CreateLevelCommand } from './commands/create-level.command.js';
import { UpdateLevelCommand } from './commands/update-level.command.js';
import { CreateLevelDto } from './dto/create-level.dto.js';
import { LevelView } from './dto/level.view.js';
import { UpdateLevelDto } from './dto/update-level.dto.js';
import { ListLevelsQuery } from './queries/list-levels.query.js';

@ApiTags('catalogue')
@ApiBearerAuth()
@Controller('catalogue/levels')
export class LevelsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The organisation's stylist levels, most junior first. */
  @Get()
  @CheckPolicies('read', 'Catalogue')
  list(@CurrentUser() user: AuthUser): Promise<LevelView[]> {
    return this.queries.execute(new ListLevelsQuery(user));
  }

  @Post()
  @CheckPolicies('create', 'Catalogue')
  create(@CurrentUser() user: AuthUser, @Body() body: CreateLevelDto): Promise<LevelView> {
    return this.commands.execute(new CreateLevelCommand(user, body));
  }

  /** Rename a level or change its rank. */
  @Patch(':id')
  @CheckPolicies('update', 'Catalogue')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: UpdateLevelDto): Promise<LevelView> {
    return this.commands.execute(new UpdateLevelCommand(user, id, body));
  }
}
