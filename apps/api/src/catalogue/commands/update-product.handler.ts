import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { ValidationFailedError } from '../../common/validation-failed.error.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { productCodeTaken, productNotFound } from '../catalogue-errors.js';
import { type ProductView, toProductView } from '../dto/product.view.js';
import { ProductUpdated } from '../events/product-updated.js';
import { definedOnly, refuseNulls } from '../patch-fields.js';
import { derivedCost, type ProductFigures, productRuleProblems } from '../product-rules.js';
import { ProductsRepository } from '../products.repository.js';
import { UpdateProductCommand } from './update-product.command.js';

@CommandHandler(UpdateProductCommand)
export class UpdateProductHandler implements ICommandHandler<UpdateProductCommand> {
  constructor(
    private readonly database: Database,
    private readonly products: ProductsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, productId, changes }: UpdateProductCommand): Promise<ProductView> {
    const ability = this.abilities.createFor(user);
    refuseNulls(changes, ['developerVolume', 'densityGramsPerMl', 'retailPrice']);
    const sent = definedOnly(changes);
    return this.database.transaction(async () => {
      const current = await this.products.findInOrganisation(user.organisationId, productId);
      if (!current) throw productNotFound();
      assertCan(ability, user.role, 'update', 'Catalogue', current, productNotFound);
      if (Object.keys(sent).length === 0) return toProductView(current);
      // The rules and the cost per gram are checked on the product as it will be, not on the fields sent.
      const figures: ProductFigures = {
        kind: sent.kind ?? current.kind,
        developerVolume: 'developerVolume' in sent ? (sent.developerVolume ?? null) : current.developerVolume,
        containerSize: sent.containerSize ?? current.containerSize,
        containerUnit: sent.containerUnit ?? current.containerUnit,
        densityGramsPerMl: 'densityGramsPerMl' in sent ? (sent.densityGramsPerMl ?? null) : current.densityGramsPerMl,
        containerCost: sent.containerCost ?? current.containerCost,
        retailPrice: 'retailPrice' in sent ? (sent.retailPrice ?? null) : current.retailPrice,
      };
      const problems = productRuleProblems(figures);
      if (problems.length > 0) throw new ValidationFailedError(problems);
      if (sent.code !== undefined && (await this.products.codeTaken(user.organisationId, sent.code, productId))) {
        throw productCodeTaken(sent.code);
      }
      const row = await this.products.update(productId, {
        code: sent.code,
        name: sent.name,
        active: sent.active,
        ...figures,
        ...derivedCost(figures),
      });
      const after = toProductView(row);
      await this.events.append(new ProductUpdated(user.organisationId, productId, user.id, toProductView(current), after));
      return after;
    });
  }
}
