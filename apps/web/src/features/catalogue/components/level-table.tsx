import { Button, HTMLTable } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';
import type { Level } from '../api/catalogue-queries';

type Props = { levels: Level[]; onEdit?: (level: Level) => void };

export function LevelTable({ levels, onEdit }: Props) {
  return (
    <div className="tr-table-frame tr-catalogue-narrow-frame">
      <HTMLTable compact striped className="tr-table" aria-label="Stylist levels">
        <thead>
          <tr>
            <th scope="col" className="tr-figure">
              Rank
            </th>
            <th scope="col">Level</th>
            {onEdit && (
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {levels.map((level) => (
            <tr key={level.id}>
              <td className="tr-figure">{level.rank}</td>
              <td className="tr-row-head">{level.name}</td>
              {onEdit && (
                <td className="tr-row-actions">
                  <Button size="small" variant="minimal" icon={<EditIcon />} text="Edit" aria-label={`Edit level ${level.name}`} onClick={() => onEdit(level)} />
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
