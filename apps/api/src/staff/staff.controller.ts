import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { CreateStaffCommand } from './commands/create-staff.command.js';
import { UpdateStaffCommand } from './commands/update-staff.command.js';
import { CreateStaffDto } from './dto/create-staff.dto.js';
import { ListStaffDto } from './dto/list-staff.dto.js';
import { StaffView } from './dto/staff.view.js';
import { UpdateStaffDto } from './dto/update-staff.dto.js';
import { GetStaffQuery } from './queries/get-staff.query.js';
import { ListStaffQuery } from './queries/list-staff.query.js';

@ApiTags('staff')
@ApiBearerAuth()
@Controller('staff')
export class StaffController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The staff of the branches the caller may see, by name; `hourlyRate` only where the caller may see pay. */
  @Get()
  @CheckPolicies('read', 'Staff')
  list(@CurrentUser() user: AuthUser, @Query() filter: ListStaffDto): Promise<StaffView[]> {
    return this.queries.execute(new ListStaffQuery(user, filter));
  }

  @Get(':id')
  @CheckPolicies('read', 'Staff')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<StaffView> {
    return this.queries.execute(new GetStaffQuery(user, id));
  }

  /** Add a staff member to a branch where the caller manages staff; an hourly rate needs the right to change pay. */
  @Post()
  @CheckPolicies('create', 'Staff')
  create(@CurrentUser() user: AuthUser, @Body() body: CreateStaffDto): Promise<StaffView> {
    return this.commands.execute(new CreateStaffCommand(user, body));
  }

  /** Change a staff member, link or unlink their sign-in, or make them inactive. */
  @Patch(':id')
  @CheckPolicies('update', 'Staff')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: UpdateStaffDto): Promise<StaffView> {
    return this.commands.execute(new UpdateStaffCommand(user, id, body));
  }
}
