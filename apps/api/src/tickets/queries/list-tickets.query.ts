import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketSummaryView } from '../dto/ticket-summary.view.js';

export class ListTicketsQuery extends Query<TicketSummaryView[]> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
    readonly date: string | undefined,
  ) {
    super();
  }
}
