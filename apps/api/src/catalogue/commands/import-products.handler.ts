import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { readSpreadsheet } from '../../common/spreadsheet-reader.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { productNotFound } from '../catalogue-errors.js';
import type { ImportResultView } from '../dto/import-result.view.js';
import { toProductView } from '../dto/product.view.js';
import { ProductCreated } from '../events/product-created.js';
import { ProductUpdated } from '../events/product-updated.js';
import { assertAllRowsGood, toImportResult } from '../import/import-plan.js';
import { type PlannedProduct, ProductSheet } from '../import/product-sheet.js';
import { derivedCost } from '../product-rules.js';
import { ProductsRepository } from '../products.repository.js';
import { ImportProductsCommand } from './import-products.command.js';

// One ProductCreated or ProductUpdated event per written row (with the file and row it came from),
// so a product's history reads the same whether it was edited by hand or uploaded.
@CommandHandler(ImportProductsCommand)
export class ImportProductsHandler implements ICommandHandler<ImportProductsCommand> {
  constructor(
    private readonly database: Database,
    private readonly products: ProductsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, file, commit }: ImportProductsCommand): Promise<ImportResultView> {
    const ability = this.abilities.createFor(user);
    const inOrganisation = { organisationId: user.organisationId };
    assertCan(ability, user.role, 'create', 'Catalogue', inOrganisation, productNotFound);
    assertCan(ability, user.role, 'update', 'Catalogue', inOrganisation, productNotFound);
    const sheet = await readSpreadsheet(file);
    const products = ProductSheet.read(sheet);
    return this.database.transaction(async () => {
      const plan = products.plan(await this.products.findByCodes(user.organisationId, products.codes()));
      if (!commit) return toImportResult(plan, false);
      assertAllRowsGood(plan);
      for (const planned of plan) await this.write(user.organisationId, user.id, planned, sheet.fileName);
      return toImportResult(plan, true);
    });
  }

  private async write(organisationId: string, actorId: string, planned: PlannedProduct, fileName: string): Promise<void> {
    const { write, existing, action, row } = planned;
    if (!write || action === 'unchanged') return;
    const importedFrom = { file: fileName, row };
    const fields = { code: write.code, name: write.name, ...write.figures, ...derivedCost(write.figures) };
    if (!existing) {
      const created = await this.products.insert({ organisationId, ...fields });
      await this.events.append(new ProductCreated(organisationId, created.id, actorId, toProductView(created), importedFrom));
    } else {
      const updated = await this.products.update(existing.id, fields);
      await this.events.append(new ProductUpdated(organisationId, existing.id, actorId, toProductView(existing), toProductView(updated), importedFrom));
    }
  }
}
