import type { RecordableEvent } from '../../events/recordable-event.js';
import type { ProductView } from '../dto/product.view.js';
import type { ImportedFrom } from './imported-from.js';

export class ProductCreated implements RecordableEvent {
  readonly aggregateType = 'Product';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    after: ProductView,
    importedFrom?: ImportedFrom,
  ) {
    this.payload = importedFrom ? { after, importedFrom } : { after };
  }
}
