import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { DayPreviewView } from '../dto/day-preview.view.js';

export class GetDayPreviewQuery extends Query<DayPreviewView> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
    readonly businessDate: string,
  ) {
    super();
  }
}
