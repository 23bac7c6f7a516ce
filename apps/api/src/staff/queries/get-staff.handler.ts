import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { staff } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { type StaffView, toStaffView } from '../dto/staff.view.js';
import { readableStaff } from '../readable-staff.js';
import { staffNotFound } from '../staff-errors.js';
import { canOnPay } from '../staff-pay.js';
import { StaffRepository } from '../staff.repository.js';
import { GetStaffQuery } from './get-staff.query.js';

@QueryHandler(GetStaffQuery)
export class GetStaffHandler implements IQueryHandler<GetStaffQuery> {
  constructor(
    private readonly staff: StaffRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, staffId }: GetStaffQuery): Promise<StaffView> {
    const ability = this.abilities.createFor(user);
    const [row] = await this.staff.viewRows(and(eq(staff.id, staffId), readableStaff(ability)));
    if (!row) throw staffNotFound();
    return toStaffView(row, canOnPay(ability, 'read', row));
  }
}
