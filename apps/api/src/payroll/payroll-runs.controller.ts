import { Controller, Get, HttpCode, Param, Post, Res, StreamableFile } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { ApprovePayrollRunCommand } from './commands/approve-payroll-run.command.js';
import { type ExportedFile, ExportPayrollRunCommand } from './commands/export-payroll-run.command.js';
import { SendPayStatementsCommand } from './commands/send-pay-statements.command.js';
import { StartPayrollRunCommand } from './commands/start-payroll-run.command.js';
import { PayrollLineDetailView, PayrollLineView, PayrollRunView } from './dto/payroll-run.view.js';
import { SentStatementsView } from './dto/sent-statements.view.js';
import { GetPayStatementQuery } from './queries/get-pay-statement.query.js';
import { GetPayrollLineQuery } from './queries/get-payroll-line.query.js';
import { GetPayrollRunQuery } from './queries/get-payroll-run.query.js';
import { ListPayrollLinesQuery } from './queries/list-payroll-lines.query.js';

@ApiTags('payroll')
@ApiBearerAuth()
@Controller('payroll')
export class PayrollRunsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /**
   * Starts the period's payroll run, replacing a draft (409 once approved). Answers 202 at once; poll
   * GET /payroll/runs/:id until its status leaves `computing` (owner, accountant).
   */
  @Post('periods/:id/runs')
  @HttpCode(202)
  @CheckPolicies('create', 'PayrollRun')
  start(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<PayrollRunView> {
    return this.commands.execute(new StartPayrollRunCommand(user, id));
  }

  /** The run's status and progress (processed of total staff). */
  @Get('runs/:id')
  @CheckPolicies('read', 'PayrollRun')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<PayrollRunView> {
    return this.queries.execute(new GetPayrollRunQuery(user, id));
  }

  /** Freezes a draft run (owner, accountant); any later change answers 409. */
  @Post('runs/:id/approve')
  @HttpCode(200)
  @CheckPolicies('update', 'PayrollRun')
  approve(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<PayrollRunView> {
    return this.commands.execute(new ApprovePayrollRunCommand(user, id));
  }

  /** The run's lines the caller may see: all (owner, accountant), their branches' drafts (manager), their own (stylist). */
  @Get('runs/:id/lines')
  @CheckPolicies('read', 'PayrollLine')
  lines(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<PayrollLineView[]> {
    return this.queries.execute(new ListPayrollLinesQuery(user, id));
  }

  /** One line with its stored input and every figure of the computation (tier breakdown, workweeks). */
  @Get('runs/:id/lines/:lineId')
  @CheckPolicies('read', 'PayrollLine')
  line(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Param('lineId', ParseId('lineId')) lineId: string): Promise<PayrollLineDetailView> {
    return this.queries.execute(new GetPayrollLineQuery(user, id, lineId));
  }

  /** The accountant's workbook of an approved run (Summary, one sheet per branch, Lines); marks the run exported. */
  @Get('runs/:id/workbook')
  @CheckPolicies('update', 'PayrollRun')
  @ApiProduces('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
  async workbook(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Res({ passthrough: true }) response: Response): Promise<StreamableFile> {
    return send(response, await this.commands.execute(new ExportPayrollRunCommand(user, id, 'xlsx')));
  }

  /** The Summary of an approved run as CSV, every field quoted; marks the run exported. */
  @Get('runs/:id/summary.csv')
  @CheckPolicies('update', 'PayrollRun')
  @ApiProduces('text/csv')
  async summaryCsv(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Res({ passthrough: true }) response: Response): Promise<StreamableFile> {
    return send(response, await this.commands.execute(new ExportPayrollRunCommand(user, id, 'csv')));
  }

  /**
   * E-mails each staff member of an approved run their statement (figures in the body, workbook attached);
   * each message is recorded in the outbox, sent or failed with the reason. Sending again is allowed.
   */
  @Post('runs/:id/statements')
  @HttpCode(200)
  @CheckPolicies('update', 'PayrollRun')
  sendStatements(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<SentStatementsView> {
    return this.commands.execute(new SendPayStatementsCommand(user, id));
  }

  /** One staff member's statement workbook: whoever may read the line (a stylist only her own). */
  @Get('runs/:id/lines/:lineId/statement.xlsx')
  @CheckPolicies('read', 'PayrollLine')
  @ApiProduces('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
  async statement(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseId()) id: string,
    @Param('lineId', ParseId('lineId')) lineId: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    return send(response, await this.queries.execute(new GetPayStatementQuery(user, id, lineId)));
  }
}

function send(response: Response, file: ExportedFile): StreamableFile {
  response.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`);
  if (!('length' in file)) return new StreamableFile(file.body, { type: file.contentType, length: file.body.length });
  // A client that goes away mid-download leaves the stream paused: close it so its file is released.
  const { body } = file;
  response.once('close', () => body.destroy());
  return new StreamableFile(body, { type: file.contentType, length: file.length });
}
