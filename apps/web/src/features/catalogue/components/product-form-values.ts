import { costPerGram } from '@tressury/domain';
import type { ContainerUnit, Product, ProductKind } from '../api/catalogue-queries';
import type { NewProduct } from '../api/use-create-product';
import type { ProductChanges } from '../api/use-update-product';
import { isVolumeUnit } from './catalogue-labels';

export type ProductFormValues = {
  code: string;
  name: string;
  kind: ProductKind;
  developerVolume: string;
  containerSize: string;
  containerUnit: ContainerUnit;
  densityGramsPerMl: string;
  containerCost: string;
  retailPrice: string;
  active: boolean;
};
export type ProductField = Exclude<keyof ProductFormValues, 'active'>;

export const productFieldOrder: ProductField[] = ['code', 'name', 'kind', 'developerVolume', 'containerSize', 'containerUnit', 'densityGramsPerMl', 'containerCost', 'retailPrice'];
export const isProductField = (field: string): field is ProductField => (productFieldOrder as string[]).includes(field);

export function formValuesOf(product?: Product): ProductFormValues {
  return {
    code: product?.code ?? '',
    name: product?.name ?? '',
    kind: product?.kind ?? 'permanent',
    developerVolume: product?.developerVolume ?? '',
    containerSize: product?.containerSize ?? '',
    containerUnit: product?.containerUnit ?? 'g',
    densityGramsPerMl: product?.densityGramsPerMl ?? '',
    containerCost: product?.containerCost ?? '',
    retailPrice: product?.retailPrice ?? '',
    active: product?.active ?? true,
  };
}

const orNull = (value: string): string | null => (value.trim() === '' ? null : value.trim());

/** The product as the API takes it: a developer volume only for developers, a density only for a volume unit. */
export function newProductOf(values: ProductFormValues): NewProduct {
  return {
    code: values.code.trim(),
    name: values.name.trim(),
    kind: values.kind,
    developerVolume: values.kind === 'developer' ? orNull(values.developerVolume) : null,
    containerSize: values.containerSize.trim(),
    containerUnit: values.containerUnit,
    densityGramsPerMl: isVolumeUnit(values.containerUnit) ? orNull(values.densityGramsPerMl) : null,
    containerCost: values.containerCost.trim(),
    retailPrice: orNull(values.retailPrice),
  };
}

/** Only what was changed is sent, so the product's history records just that. */
export function changesOf(product: Product, values: ProductFormValues): ProductChanges {
  const after = newProductOf(values);
  const before = newProductOf(formValuesOf(product));
  const changes: Record<string, unknown> = {};
  for (const field of Object.keys(after) as (keyof NewProduct)[]) {
    if (after[field] !== before[field]) changes[field] = after[field];
  }
  if (values.active !== product.active) changes.active = values.active;
  return changes as ProductChanges;
}

/** The cost of a gram as the server will derive it (libs/domain), or null while the figures are incomplete. */
export function previewCostPerGram(values: ProductFormValues): { costPerGram: string; approximate: boolean } | null {
  try {
    const density = isVolumeUnit(values.containerUnit) ? (orNull(values.densityGramsPerMl) ?? undefined) : undefined;
    return costPerGram(values.containerCost.trim(), values.containerSize.trim(), values.containerUnit, density);
  } catch {
    return null;
  }
}
