import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { staff } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { type StaffView, toStaffView } from '../dto/staff.view.js';
import { readableStaff } from '../readable-staff.js';
import { canOnPay } from '../staff-pay.js';
import { StaffRepository } from '../staff.repository.js';
import { ListStaffQuery } from './list-staff.query.js';

@QueryHandler(ListStaffQuery)
export class ListStaffHandler implements IQueryHandler<ListStaffQuery> {
  constructor(
    private readonly staff: StaffRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, filter }: ListStaffQuery): Promise<StaffView[]> {
    const ability = this.abilities.createFor(user);
    const rows = await this.staff.viewRows(
      and(
        readableStaff(ability),
        filter.branchId === undefined ? undefined : eq(staff.homeBranchId, filter.branchId),
        filter.active === undefined ? undefined : eq(staff.active, filter.active),
      ),
    );
    return rows.map((row) => toStaffView(row, canOnPay(ability, 'read', row)));
  }
}
