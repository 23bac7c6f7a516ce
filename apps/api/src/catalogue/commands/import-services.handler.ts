import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { readSpreadsheet } from '../../common/spreadsheet-reader.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { serviceNotFound } from '../catalogue-errors.js';
import type { ImportResultView } from '../dto/import-result.view.js';
import { toServiceView } from '../dto/service.view.js';
import { ServiceCreated } from '../events/service-created.js';
import { ServiceUpdated } from '../events/service-updated.js';
import { assertAllRowsGood, toImportResult } from '../import/import-plan.js';
import { type PlannedService, ServiceSheet } from '../import/service-sheet.js';
import { LevelsRepository } from '../levels.repository.js';
import { ServicesRepository } from '../services.repository.js';
import { ImportServicesCommand } from './import-services.command.js';

// One ServiceCreated or ServiceUpdated event per written row, as for products.
@CommandHandler(ImportServicesCommand)
export class ImportServicesHandler implements ICommandHandler<ImportServicesCommand> {
  constructor(
    private readonly database: Database,
    private readonly services: ServicesRepository,
    private readonly levels: LevelsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, file, commit }: ImportServicesCommand): Promise<ImportResultView> {
    const ability = this.abilities.createFor(user);
    const inOrganisation = { organisationId: user.organisationId };
    assertCan(ability, user.role, 'create', 'Catalogue', inOrganisation, serviceNotFound);
    assertCan(ability, user.role, 'update', 'Catalogue', inOrganisation, serviceNotFound);
    const sheet = await readSpreadsheet(file);
    return this.database.transaction(async () => {
      const menu = ServiceSheet.read(sheet, await this.levels.listInOrganisation(user.organisationId));
      const rows = await this.services.findByNames(user.organisationId, menu.names());
      const prices = await this.services.pricesOf(rows.map((row) => row.id));
      const plan = menu.plan(rows.map((row) => ({ row, prices: prices.get(row.id) ?? [] })));
      if (!commit) return toImportResult(plan, false);
      assertAllRowsGood(plan);
      for (const planned of plan) await this.write(user.organisationId, user.id, planned, sheet.fileName);
      return toImportResult(plan, true);
    });
  }

  private async write(organisationId: string, actorId: string, planned: PlannedService, fileName: string): Promise<void> {
    const { write, existing, action, row } = planned;
    if (!write || action === 'unchanged') return;
    const importedFrom = { file: fileName, row };
    const { prices, ...fields } = write;
    if (!existing) {
      const created = await this.services.insert({ organisationId, ...fields });
      await this.services.replacePrices(created.id, prices);
      await this.events.append(new ServiceCreated(organisationId, created.id, actorId, await this.services.view(created.id), importedFrom));
    } else {
      const before = toServiceView(existing.row, existing.prices);
      await this.services.update(existing.row.id, fields);
      await this.services.replacePrices(existing.row.id, prices);
      await this.events.append(new ServiceUpdated(organisationId, existing.row.id, actorId, before, await this.services.view(existing.row.id), importedFrom));
    }
  }
}
