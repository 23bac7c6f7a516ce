import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { branchNotFound } from '../day-close-errors.js';
import { DayCloseRepository } from '../day-close.repository.js';
import { DayPreview } from '../day-preview.js';
import type { DayPreviewView } from '../dto/day-preview.view.js';
import { GetDayPreviewQuery } from './get-day-preview.query.js';

@QueryHandler(GetDayPreviewQuery)
export class GetDayPreviewHandler implements IQueryHandler<GetDayPreviewQuery> {
  constructor(
    private readonly closes: DayCloseRepository,
    private readonly preview: DayPreview,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, branchId, businessDate }: GetDayPreviewQuery): Promise<DayPreviewView> {
    const branch = await this.closes.branch(user.organisationId, branchId);
    if (!branch) throw branchNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'DayClose', { organisationId: branch.organisationId, branchId: branch.id }, branchNotFound);
    return this.preview.build(branch, businessDate);
  }
}
