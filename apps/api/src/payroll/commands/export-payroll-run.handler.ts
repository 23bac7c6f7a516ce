import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { branches, organisations } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdtemp, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { PayrollRunExported } from '../events/payroll-run-exported.js';
import { payrollRunNotApproved, payrollRunNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { exportFileName, writePayrollWorkbook, writeSummaryCsv } from '../payroll-workbook.js';
import { readablePayrollLines } from '../readable-payroll-lines.js';
import { type ExportedFile, ExportPayrollRunCommand } from './export-payroll-run.command.js';

const CONTENT_TYPES = { xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', csv: 'text/csv; charset=utf-8' };

/**
 * Writes the approved run's workbook or summary CSV and marks the run exported. The workbook goes to a
 * temporary file first, so a large run never sits in memory and the run is marked only once the file is whole.
 */
@CommandHandler(ExportPayrollRunCommand)
export class ExportPayrollRunHandler implements ICommandHandler<ExportPayrollRunCommand> {
  constructor(
    private readonly database: Database,
    private readonly runs: PayrollRunsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId, format }: ExportPayrollRunCommand): Promise<ExportedFile> {
    const ability = this.abilities.createFor(user);
    const found = await this.runs.findRun(user.organisationId, runId);
    if (!found) throw payrollRunNotFound();
    assertCan(ability, user.role, 'update', 'PayrollRun', found.run, payrollRunNotFound);
    if (found.run.status !== 'approved' && found.run.status !== 'exported') throw payrollRunNotApproved();
    const db = this.database.db;
    const [organisation] = await db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, user.organisationId));
    const branchRows = await db.select({ id: branches.id, currency: branches.currency }).from(branches).where(eq(branches.organisationId, user.organisationId));
    const lines = await this.runs.lineFigures(runId, readablePayrollLines(ability));
    const data = {
      organisationName: organisation!.name,
      startDate: found.period.startDate,
      endDate: found.period.endDate,
      status: found.run.status,
      lines,
      currencyOf: new Map(branchRows.map((b) => [b.id, b.currency])),
      inputsOf: (lineIds: string[]) => this.runs.lineInputs(runId, lineIds),
    };
    const fileName = exportFileName(data.organisationName, data.startDate, data.endDate, format, format === 'csv' ? '-summary' : '');
    const markExported = () =>
      this.database.transaction(async () => {
        if (found.run.status === 'approved') await this.runs.updateRun(runId, { status: 'exported', exportedById: user.id, exportedAt: new Date() });
        await this.events.append(new PayrollRunExported(user.organisationId, runId, user.id, { format, lines: lines.length }));
      });
    if (format === 'csv') {
      const body = Buffer.from(writeSummaryCsv(lines), 'utf8');
      await markExported();
      return { fileName, contentType: CONTENT_TYPES.csv, body };
    }

    const directory = await mkdtemp(join(tmpdir(), 'tressury-export-'));
    const removeDirectory = () => rm(directory, { recursive: true, force: true });
    try {
      const path = join(directory, 'payroll.xlsx');
      await writePayrollWorkbook(data, createWriteStream(path));
      await markExported();
      const { size } = await stat(path);
      const body = createReadStream(path);
      body.once('close', () => void removeDirectory());
      return { fileName, contentType: CONTENT_TYPES.xlsx, body, length: size };
    } catch (error) {
      await removeDirectory();
      throw error;
    }
  }
}
