import { Button, HTMLTable, Tag } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';
import type { Branch } from '../api/branch-queries';
import { percentText } from './branch-figures';

export function BranchTable({ branches, onEdit }: { branches: Branch[]; onEdit: (branch: Branch) => void }) {
  return (
    <div className="tr-table-frame">
      <HTMLTable compact striped className="tr-table" aria-label="Branches">
        <thead>
          <tr>
            <th scope="col">Name</th>
            <th scope="col">Time zone</th>
            <th scope="col">Currency</th>
            <th scope="col" className="tr-figure">
              Minimum wage
            </th>
            <th scope="col" className="tr-figure">
              Overtime after (h)
            </th>
            <th scope="col" className="tr-figure">
              Overtime ×
            </th>
            <th scope="col">Commission exemption</th>
            <th scope="col" className="tr-figure">
              Retail tax
            </th>
            <th scope="col">
              <span className="tr-visually-hidden">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {branches.map((branch) => (
            <tr key={branch.id}>
              <td className="tr-row-head">{branch.name}</td>
              <td className="tr-nowrap">{branch.timeZone.replaceAll('_', ' ')}</td>
              <td>{branch.currency}</td>
              <td className="tr-figure">{branch.minimumWage}</td>
              <td className="tr-figure">{branch.overtimeAfterHours}</td>
              <td className="tr-figure">{branch.overtimeMultiplier}</td>
              <td>{branch.commissionExemption ? <Tag minimal intent="primary">On</Tag> : <span className="tr-muted">Off</span>}</td>
              <td className="tr-figure">{`${percentText(branch.retailTaxRate) ?? branch.retailTaxRate} %`}</td>
              <td className="tr-row-actions">
                <Button size="small" variant="minimal" icon={<EditIcon />} text="Edit" aria-label={`Edit ${branch.name}`} onClick={() => onEdit(branch)} />
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
