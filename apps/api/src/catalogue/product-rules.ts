import type { ContainerUnitName, ProductKind } from '@tressury/schema';
import { costPerGram } from '@tressury/domain';
import type { FieldProblem } from '../common/validation-failed.error.js';

/** A product's fields that the rules below and the derived cost depend on, as stored. */
export type ProductFigures = {
  kind: ProductKind;
  developerVolume: string | null;
  containerSize: string;
  containerUnit: ContainerUnitName;
  densityGramsPerMl: string | null;
  containerCost: string;
  retailPrice: string | null;
};

type Label = (field: keyof ProductFigures) => string;

/** The rules that tie one field to another; each field's own format is checked where it is read. */
export function productRuleProblems(product: ProductFigures, label: Label = (field) => field): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const volume = label('developerVolume');
  if (product.kind === 'developer' && product.developerVolume === null) {
    problems.push({ field: volume, message: `${volume} is required for a developer: its strength in volumes, such as 20` });
  }
  if (product.kind !== 'developer' && product.developerVolume !== null) {
    problems.push({ field: volume, message: `${volume} is only for developers; leave it empty for a ${product.kind} product` });
  }
  if (product.kind === 'retail' && product.retailPrice === null) {
    const price = label('retailPrice');
    problems.push({ field: price, message: `${price} is required for a retail product` });
  }
  return problems;
}

/** Cost per gram is never taken from the client: libs/domain derives it from the container. */
export function derivedCost(product: ProductFigures): { costPerGram: string; costPerGramApproximate: boolean } {
  const { costPerGram: perGram, approximate } = costPerGram(
    product.containerCost,
    product.containerSize,
    product.containerUnit,
    product.densityGramsPerMl ?? undefined,
  );
  return { costPerGram: perGram, costPerGramApproximate: approximate };
}
