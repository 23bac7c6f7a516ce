import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, reconcileDay } from '@tressury/domain';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { branchNotFound, cannotClose } from '../day-close-errors.js';
import { DayCloseRepository } from '../day-close.repository.js';
import { DayFiguresQuery } from '../day-figures.js';
import { DayPreview } from '../day-preview.js';
import type { DayPreviewView } from '../dto/day-preview.view.js';
import { DayClosed } from '../events/day-closed.js';
import { CloseDayCommand } from './close-day.command.js';

/**
 * Closing a branch's day records the drawer count and the card totals against what the tickets say;
 * afterwards that day's tickets are locked. The branch-day lock and the unique (branch, date) index
 * make a second, simultaneous close answer 409.
 */
@CommandHandler(CloseDayCommand)
export class CloseDayHandler implements ICommandHandler<CloseDayCommand> {
  constructor(
    private readonly database: Database,
    private readonly closes: DayCloseRepository,
    private readonly figures: DayFiguresQuery,
    private readonly preview: DayPreview,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CloseDayCommand): Promise<DayPreviewView> {
    const branch = await this.closes.branch(user.organisationId, input.branchId);
    if (!branch) throw branchNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'create', 'DayClose', { organisationId: branch.organisationId, branchId: branch.id }, branchNotFound);
    if (input.businessDate > businessDateIn(branch.timeZone)) {
      throw new DomainError('day.in_future', 'A day can be closed once it has begun.', 'invalid', 'businessDate');
    }
    const cardTotalProcessor = await this.preview.processorTotal(branch, input.businessDate);

    const close = await this.database.transaction(async () => {
      await this.database.lockBranchDay(branch.id, input.businessDate);
      if (await this.closes.find(branch.id, input.businessDate)) throw cannotClose('already_closed', `${branch.name} ${input.businessDate} is already closed.`);
      const day = await this.figures.forDay(branch.id, input.businessDate);
      if (day.openTickets.length > 0) {
        throw cannotClose('open_tickets', `Close or void every ticket first: ${day.openTickets.map((t) => `ticket ${t.number}`).join(', ')} still open.`);
      }
      if (day.pendingCardPayments > 0) throw cannotClose('pending_payments', 'A card payment is still waiting for the card processor.');
      const reconciled = reconcileDay({
        expectedCash: day.expectedCash,
        countedCash: input.countedCash,
        denominations: input.denominations,
        cardTotalTickets: day.cardTotalTickets,
        cardTotalProcessor,
        varianceNoteThreshold: branch.varianceNoteThreshold,
      });
      const note = input.note?.trim() ?? '';
      if (reconciled.needsNote && note.length < 3) {
        throw new DomainError(
          'day.note_required',
          `Cash is ${reconciled.cashVariance} and card ${reconciled.cardVariance} against the day's tickets; above ${branch.varianceNoteThreshold} a note explaining it is required.`,
          'invalid',
          'note',
        );
      }
      const row = await this.closes.insert({
        organisationId: branch.organisationId,
        branchId: branch.id,
        businessDate: input.businessDate,
        expectedCash: day.expectedCash,
        countedCash: reconciled.countedCash,
        cashDenominations: input.denominations ?? null,
        cashVariance: reconciled.cashVariance,
        cardTotalTickets: day.cardTotalTickets,
        cardTotalProcessor,
        cardVariance: reconciled.cardVariance,
        note,
        closedById: user.id,
      });
      await this.events.append(new DayClosed(branch.organisationId, row.id, user.id, { branchId: branch.id, businessDate: input.businessDate, ...reconciled, figures: day }));
      return row;
    });
    return this.preview.build(branch, close.businessDate);
  }
}
