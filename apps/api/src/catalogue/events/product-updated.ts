import type { RecordableEvent } from '../../events/recordable-event.js';
import type { ProductView } from '../dto/product.view.js';
import type { ImportedFrom } from './imported-from.js';

export class ProductUpdated implements RecordableEvent {
  readonly aggregateType = 'Product';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    before: ProductView,
    after: ProductView,
    importedFrom?: ImportedFrom,
  ) {
    this.payload = importedFrom ? { before, after, importedFrom } : { before, after };
  }
}
