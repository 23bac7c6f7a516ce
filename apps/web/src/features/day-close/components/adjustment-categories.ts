import type { NewAdjustment } from '../api/use-add-adjustment';

/** What an adjustment corrects, in the words a manager uses. */
export const adjustmentCategories: Record<NewAdjustment['category'], string> = {
  service: 'Service revenue',
  retail: 'Retail sales',
  tip: 'Tip',
  product_charge: 'Product charge',
  cash: 'Cash in the drawer',
};

export const categoryName = (category: string): string => adjustmentCategories[category as NewAdjustment['category']] ?? category;
