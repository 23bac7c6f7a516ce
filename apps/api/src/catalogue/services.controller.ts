import { Body, Controller, Get, HttpCode, Param, Patch, Post, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import type { UploadedSpreadsheet } from '../common/spreadsheet-reader.js';
import { CreateServiceCommand } from './commands/create-service.command.js';
import { ImportServicesCommand } from './commands/import-services.command.js';
import { UpdateServiceCommand } from './commands/update-service.command.js';
import { CreateServiceDto } from './dto/create-service.dto.js';
import { ImportOptionsDto } from './dto/import-options.dto.js';
import { ImportResultView } from './dto/import-result.view.js';
import { ListServicesDto } from './dto/list-services.dto.js';
import { ServiceView } from './dto/service.view.js';
import { UpdateServiceDto } from './dto/update-service.dto.js';
import { GetServiceQuery } from './queries/get-service.query.js';
import { ListServicesQuery } from './queries/list-services.query.js';
import { SpreadsheetUploadInterceptor } from '../common/spreadsheet-upload.interceptor.js';
import { SpreadsheetUploadDocs } from './upload-docs.js';

@ApiTags('catalogue')
@ApiBearerAuth()
@Controller('catalogue/services')
export class ServicesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The service menu by category and name, with a price per level. */
  @Get()
  @CheckPolicies('read', 'Catalogue')
  list(@CurrentUser() user: AuthUser, @Query() filter: ListServicesDto): Promise<ServiceView[]> {
    return this.queries.execute(new ListServicesQuery(user, filter));
  }

  @Get(':id')
  @CheckPolicies('read', 'Catalogue')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<ServiceView> {
    return this.queries.execute(new GetServiceQuery(user, id));
  }

  @Post()
  @CheckPolicies('create', 'Catalogue')
  create(@CurrentUser() user: AuthUser, @Body() body: CreateServiceDto): Promise<ServiceView> {
    return this.commands.execute(new CreateServiceCommand(user, body));
  }

  /** Change a service; `prices`, when sent, replaces all of its prices. */
  @Patch(':id')
  @CheckPolicies('update', 'Catalogue')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: UpdateServiceDto): Promise<ServiceView> {
    return this.commands.execute(new UpdateServiceCommand(user, id, body));
  }

  @Post('import')
  @HttpCode(200)
  @CheckPolicies('create', 'Catalogue')
  @UseInterceptors(SpreadsheetUploadInterceptor)
  @SpreadsheetUploadDocs('Preview or commit a service menu spreadsheet', [
    'One row per service, matched to the menu by `name`: a new name creates a service, a known one updates it.',
    'Headings: `name`, `category`, `duration_minutes` (whole minutes, 1–720) are required; `is_colour` (yes/no, true/false, 1/0; empty is no) is optional; and one `price:<level name>` column per level that offers the service, e.g. `price:Senior` (the level name in any case).',
    'A level without a price column keeps each existing service’s price at that level; an empty price cell takes the service off that level. An `is_colour` column left out keeps the existing setting.',
  ])
  import(@CurrentUser() user: AuthUser, @UploadedFile() file: UploadedSpreadsheet | undefined, @Query() options: ImportOptionsDto): Promise<ImportResultView> {
    return this.commands.execute(new ImportServicesCommand(user, file, options.commit ?? false));
  }
}
