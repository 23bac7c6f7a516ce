import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PageQueryDto } from '../../common/page-query.dto.js';
import type { OutboundMessageView } from '../dto/outbound-message.view.js';

export class ListOutboxQuery extends Query<OutboundMessageView[]> {
  constructor(
    readonly user: AuthUser,
    readonly page: PageQueryDto,
  ) {
    super();
  }
}
