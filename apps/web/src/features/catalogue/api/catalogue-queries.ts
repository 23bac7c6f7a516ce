import { queryOptions } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';

export type Level = components['schemas']['LevelView'];
export type Service = components['schemas']['ServiceView'];
export type Product = components['schemas']['ProductView'];
export type ProductKind = Product['kind'];
export type ContainerUnit = Product['containerUnit'];

export const catalogueKeys = {
  all: ['catalogue'] as const,
  levels: () => [...catalogueKeys.all, 'levels'] as const,
  services: () => [...catalogueKeys.all, 'services'] as const,
  products: () => [...catalogueKeys.all, 'products'] as const,
};

export const catalogueQueries = {
  levels: () => queryOptions({ queryKey: catalogueKeys.levels(), queryFn: () => expectData(http.GET('/api/catalogue/levels')) }),
  services: () => queryOptions({ queryKey: catalogueKeys.services(), queryFn: () => expectData(http.GET('/api/catalogue/services')) }),
  products: () => queryOptions({ queryKey: catalogueKeys.products(), queryFn: () => expectData(http.GET('/api/catalogue/products')) }),
};
