import { Body, Controller, Get, Patch } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { RenameOrganisationCommand } from './commands/rename-organisation.command.js';
import { OrganisationView } from './dto/organisation.view.js';
import { RenameOrganisationDto } from './dto/rename-organisation.dto.js';
import { GetOrganisationQuery } from './queries/get-organisation.query.js';

@ApiTags('organisation')
@ApiBearerAuth()
@Controller('organisation')
export class OrganisationController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Get()
  @CheckPolicies('read', 'Organisation')
  get(@CurrentUser() user: AuthUser): Promise<OrganisationView> {
    return this.queries.execute(new GetOrganisationQuery(user));
  }

  @Patch()
  @CheckPolicies('update', 'Organisation')
  rename(@CurrentUser() user: AuthUser, @Body() body: RenameOrganisationDto): Promise<OrganisationView> {
    return this.commands.execute(new RenameOrganisationCommand(user, body.name));
  }
}
