import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CreateServiceDto } from '../dto/create-service.dto.js';
import type { ServiceView } from '../dto/service.view.js';

export class CreateServiceCommand extends Command<ServiceView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreateServiceDto,
  ) {
    super();
  }
}
