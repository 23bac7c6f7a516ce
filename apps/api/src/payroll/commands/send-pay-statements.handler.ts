import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError } from '@tressury/domain';
import type { OutboundMessageRow, PayrollLineRow } from '@tressury/schema';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan, refusal } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { toOutboundMessageView } from '../../mail/dto/outbound-message.view.js';
import { Mailer } from '../../mail/mailer.js';
import type { SentStatementsView } from '../dto/sent-statements.view.js';
import { PayStatementsSent } from '../events/pay-statements-sent.js';
import { type PayStatement, STATEMENT_CONTENT_TYPE, statementFileName, statementSubject, statementText, writeStatementWorkbook } from '../pay-statement.js';
import { PayStatementsRepository } from '../pay-statements.repository.js';
import { payrollRunNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { readablePayrollLines } from '../readable-payroll-lines.js';
import { SendPayStatementsCommand } from './send-pay-statements.command.js';

const statementsNeedApproval = (status: string) =>
  new DomainError('payroll_run.not_approved', `Statements go out for an approved payroll run only; this run is ${status}.`, 'conflict');

// A few messages in flight at once: quicker than one by one, gentle on the mail server's limits.
const CONCURRENCY = 3;

/**
 * E-mails every staff member of an approved run their statement, figures in the body and the workbook
 * attached. Mail goes out with no transaction open; each outcome is recorded in the outbox as it happens, so a
 * failure part-way loses nothing and sending again is always allowed.
 */
@CommandHandler(SendPayStatementsCommand)
export class SendPayStatementsHandler implements ICommandHandler<SendPayStatementsCommand> {
  constructor(
    private readonly database: Database,
    private readonly runs: PayrollRunsRepository,
    private readonly statements: PayStatementsRepository,
    private readonly mailer: Mailer,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId }: SendPayStatementsCommand): Promise<SentStatementsView> {
    const ability = this.abilities.createFor(user);
    const found = await this.runs.findRun(user.organisationId, runId);
    if (!found) throw payrollRunNotFound();
    assertCan(ability, user.role, 'update', 'PayrollRun', found.run, payrollRunNotFound);
    if (!ability.can('create', 'OutboundMessage')) throw refusal(user.role, 'create', 'OutboundMessage');
    if (found.run.status !== 'approved' && found.run.status !== 'exported') throw statementsNeedApproval(found.run.status);

    const lines = await this.runs.lines(runId, readablePayrollLines(ability));
    const [organisationName, currencyOf, emails] = await Promise.all([
      this.statements.organisationName(user.organisationId),
      this.statements.branchCurrencies(user.organisationId),
      this.statements.emails(user.organisationId, lines.map((l) => l.staffId)),
    ]);
    const statementOf = (line: PayrollLineRow): PayStatement => ({
      organisationName,
      startDate: found.period.startDate,
      endDate: found.period.endDate,
      runStatus: found.run.status,
      currency: currencyOf.get(line.branchId) ?? '',
      line,
    });

    const recorded = await mapLimited(lines, CONCURRENCY, async (line): Promise<OutboundMessageRow> => {
      const statement = statementOf(line);
      const mail = {
        organisationId: user.organisationId,
        kind: 'pay_statement',
        recipientStaffId: line.staffId,
        subject: statementSubject(statement),
        text: statementText(statement),
        subjectRef: `payroll_run:${runId}`,
        sentById: user.id,
      };
      const address = emails.get(line.staffId) ?? null;
      if (!address) {
        return this.mailer.recordNotSent(
          { ...mail, to: { name: line.staffName, address: null } },
          `No e-mail address on file for ${line.staffName}: add one under People, then send the statements again.`,
        );
      }
      const attachment = { filename: statementFileName(statement), contentType: STATEMENT_CONTENT_TYPE, content: await writeStatementWorkbook(statement) };
      return this.mailer.send({ ...mail, to: { name: line.staffName, address }, attachment });
    });

    const sent = recorded.filter((m) => m.status === 'sent').length;
    await this.database.transaction(() =>
      this.events.append(
        new PayStatementsSent(user.organisationId, runId, user.id, { sent, failed: recorded.length - sent, messageIds: recorded.map((m) => m.id) }),
      ),
    );
    return { sent, failed: recorded.length - sent, messages: recorded.map(toOutboundMessageView) };
  }
}

/** `work` over every item with at most `limit` running at once; results in the items' order. */
async function mapLimited<T, R>(items: T[], limit: number, work: (item: T) => Promise<R>): Promise<R[]> {
  const results: R[] = new Array<R>(items.length);
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const index = next++;
      results[index] = await work(items[index]!);
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
  return results;
}
