import { HTMLTable } from '@blueprintjs/core';
import { businessDateText } from '../../../lib/business-date';
import type { Formula } from '../api/client-queries';
import { plainFigure, ratioText } from './formula-figures';

/** Every bowl mixed for the client, newest first; the cost column only when the server sent costs. */
export function FormulaTable({ formulas }: { formulas: Formula[] }) {
  const showsCost = formulas.some((f) => f.cost !== undefined);
  return (
    <div className="tr-table-frame">
      <HTMLTable compact striped className="tr-table tr-clients-formulas" aria-label="Formula history">
        <thead>
          <tr>
            <th scope="col">Date and branch</th>
            <th scope="col">Service and stylist</th>
            <th scope="col">Mix</th>
            <th scope="col" className="tr-figure">
              Ratio
            </th>
            <th scope="col" className="tr-figure">
              Processing
            </th>
            <th scope="col" className="tr-figure">
              Leftover
            </th>
            <th scope="col">Note</th>
            {showsCost && (
              <th scope="col" className="tr-figure">
                Product cost
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {formulas.map((formula) => (
            <tr key={formula.id}>
              <td className="tr-nowrap">
                {businessDateText(formula.date)}
                <div className="tr-muted tr-clients-small">{formula.branchName}</div>
              </td>
              <td className="tr-clients-service">
                {formula.serviceName}
                <div className="tr-muted tr-clients-small">
                  {formula.stylistName}
                  {formula.mixedByName !== formula.stylistName && `, mixed by ${formula.mixedByName}`}
                </div>
              </td>
              <td>
                <ul className="tr-clients-mix" aria-label="Components">
                  {formula.components.map((component, index) => (
                    <li key={index}>
                      <span>{component.productName}</span>
                      <span className="tr-figure">{plainFigure(component.grams)} g</span>
                      <span className="tr-figure tr-muted">{component.developerVolume !== null ? `${plainFigure(component.developerVolume)} vol` : ''}</span>
                    </li>
                  ))}
                </ul>
              </td>
              <td className="tr-figure">{ratioText(formula.ratio)}</td>
              <td className="tr-figure">{formula.processingMinutes === null ? '—' : `${formula.processingMinutes} min`}</td>
              <td className="tr-figure">{plainFigure(formula.leftoverGrams)} g</td>
              <td className="tr-clients-note">{formula.note || <span className="tr-muted">—</span>}</td>
              {showsCost && <td className="tr-figure">{formula.cost ?? '—'}</td>}
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
