import { Button, HTMLTable, Intent, Tag, Tooltip } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';
import type { Product } from '../api/catalogue-queries';
import { APPROXIMATE_COST_NOTE, kindLabel, plainFigure } from './catalogue-labels';

type Props = { products: Product[]; onEdit?: (product: Product) => void };

export function ProductTable({ products, onEdit }: Props) {
  return (
    <div className="tr-table-frame">
      <HTMLTable compact striped className="tr-table tr-catalogue-products" aria-label="Products">
        <thead>
          <tr>
            <th scope="col">Code</th>
            <th scope="col">Name</th>
            <th scope="col">Kind</th>
            <th scope="col" className="tr-figure">
              Container
            </th>
            <th scope="col" className="tr-figure">
              Container cost
            </th>
            <th scope="col" className="tr-figure">
              Cost per gram
            </th>
            <th scope="col" className="tr-figure">
              Retail price
            </th>
            <th scope="col" className="tr-figure">
              Developer
            </th>
            {onEdit && (
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {products.map((product) => (
            <tr key={product.id} className={product.active ? undefined : 'tr-catalogue-retired'}>
              <td className="tr-nowrap tr-catalogue-code">{product.code}</td>
              <td className="tr-row-head">
                {product.name}
                {!product.active && (
                  <Tag minimal intent={Intent.WARNING} className="tr-catalogue-inline-tag">
                    Withdrawn
                  </Tag>
                )}
              </td>
              <td className="tr-nowrap">{kindLabel(product.kind)}</td>
              <td className="tr-figure">{`${plainFigure(product.containerSize)} ${product.containerUnit}`}</td>
              <td className="tr-figure">{product.containerCost}</td>
              <td className="tr-figure">
                {product.costPerGramApproximate && (
                  <Tooltip content={APPROXIMATE_COST_NOTE} className="tr-catalogue-approx" placement="top">
                    <Tag minimal intent={Intent.WARNING} tabIndex={0} aria-label={`approx.: ${APPROXIMATE_COST_NOTE}`}>
                      approx.
                    </Tag>
                  </Tooltip>
                )}
                {product.costPerGram}
              </td>
              <td className="tr-figure">{product.retailPrice ?? <span className="tr-muted">—</span>}</td>
              <td className="tr-figure">{product.developerVolume !== null ? `${plainFigure(product.developerVolume)} vol` : <span className="tr-muted">—</span>}</td>
              {onEdit && (
                <td className="tr-row-actions">
                  <Button size="small" variant="minimal" icon={<EditIcon />} text="Edit" aria-label={`Edit ${product.name}`} onClick={() => onEdit(product)} />
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
