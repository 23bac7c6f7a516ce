import { Module } from '@nestjs/common';
import { RenameOrganisationHandler } from './commands/rename-organisation.handler.js';
import { OrganisationController } from './organisation.controller.js';
import { OrganisationRepository } from './organisation.repository.js';
import { GetOrganisationHandler } from './queries/get-organisation.handler.js';

@Module({
  controllers: [OrganisationController],
  providers: [OrganisationRepository, RenameOrganisationHandler, GetOrganisationHandler],
})
export class OrganisationModule {}
