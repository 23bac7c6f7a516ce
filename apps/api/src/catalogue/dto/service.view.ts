import type { ServiceRow } from '@tressury/schema';

export class ServicePriceView {
  levelId: string;
  levelName: string;
  /** Menu price for a stylist of this level, decimal string. */
  price: string;
}

export class ServiceView {
  id: string;
  /** Unique on the organisation's menu. */
  name: string;
  /** The organisation's own grouping, e.g. "Cuts" or "Colour". */
  category: string;
  durationMinutes: number;
  /** Colour services need a bowl (or a "no product used" reason) before the ticket closes. */
  isColour: boolean;
  /** Inactive services stay on old tickets but are not offered on new ones. */
  active: boolean;
  /** One price per level that offers the service, most junior level first. */
  prices: ServicePriceView[];
  createdAt: string;
  updatedAt: string;
}

export function toServiceView(row: ServiceRow, prices: ServicePriceView[]): ServiceView {
  return {
    id: row.id,
    name: row.name,
    category: row.category,
    durationMinutes: row.durationMinutes,
    isColour: row.isColour,
    active: row.active,
    prices,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
