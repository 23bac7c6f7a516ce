import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { ValidationFailedError } from '../../common/validation-failed.error.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { productCodeTaken, productNotFound } from '../catalogue-errors.js';
import { type ProductView, toProductView } from '../dto/product.view.js';
import { ProductCreated } from '../events/product-created.js';
import { derivedCost, type ProductFigures, productRuleProblems } from '../product-rules.js';
import { ProductsRepository } from '../products.repository.js';
import { CreateProductCommand } from './create-product.command.js';

@CommandHandler(CreateProductCommand)
export class CreateProductHandler implements ICommandHandler<CreateProductCommand> {
  constructor(
    private readonly database: Database,
    private readonly products: ProductsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreateProductCommand): Promise<ProductView> {
    assertCan(this.abilities.createFor(user), user.role, 'create', 'Catalogue', { organisationId: user.organisationId }, productNotFound);
    const figures: ProductFigures = {
      kind: input.kind,
      developerVolume: input.developerVolume ?? null,
      containerSize: input.containerSize,
      containerUnit: input.containerUnit,
      densityGramsPerMl: input.densityGramsPerMl ?? null,
      containerCost: input.containerCost,
      retailPrice: input.retailPrice ?? null,
    };
    const problems = productRuleProblems(figures);
    if (problems.length > 0) throw new ValidationFailedError(problems);
    return this.database.transaction(async () => {
      if (await this.products.codeTaken(user.organisationId, input.code)) throw productCodeTaken(input.code);
      const row = await this.products.insert({
        organisationId: user.organisationId,
        code: input.code,
        name: input.name,
        ...figures,
        ...derivedCost(figures),
      });
      const view = toProductView(row);
      await this.events.append(new ProductCreated(user.organisationId, row.id, user.id, view));
      return view;
    });
  }
}
