import { Button, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';
import { Fragment } from 'react';
import type { Level, Service } from '../api/catalogue-queries';

type Props = { services: Service[]; levels: Level[]; onEdit?: (service: Service) => void };

/** The menu by category, one price column per stylist level (most junior first). */
export function ServiceTable({ services, levels, onEdit }: Props) {
  const categories = [...new Set(services.map((s) => s.category))];
  const columns = 4 + levels.length + (onEdit ? 1 : 0);
  return (
    <div className="tr-table-frame">
      <HTMLTable compact className="tr-table tr-catalogue-services" aria-label="Service menu">
        <thead>
          <tr>
            <th scope="col">Service</th>
            <th scope="col" className="tr-figure">
              Minutes
            </th>
            <th scope="col">Colour</th>
            <th scope="col">Status</th>
            {levels.map((level) => (
              <th key={level.id} scope="col" className="tr-figure">
                {level.name}
              </th>
            ))}
            {onEdit && (
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {categories.map((category) => (
            <Fragment key={category}>
              <tr className="tr-catalogue-group">
                <th scope="colgroup" colSpan={columns}>
                  {category}
                </th>
              </tr>
              {services
                .filter((s) => s.category === category)
                .map((service) => (
                  <tr key={service.id} className={service.active ? undefined : 'tr-catalogue-retired'}>
                    <td className="tr-row-head">{service.name}</td>
                    <td className="tr-figure">{service.durationMinutes}</td>
                    <td>{service.isColour ? <Tag minimal>Colour</Tag> : <span className="tr-muted">—</span>}</td>
                    <td>{service.active ? <span className="tr-muted">On the menu</span> : <Tag minimal intent={Intent.WARNING}>Off the menu</Tag>}</td>
                    {levels.map((level) => {
                      const price = service.prices.find((p) => p.levelId === level.id)?.price;
                      return (
                        <td key={level.id} className="tr-figure">
                          {price ?? <span className="tr-muted" title={`Not offered at ${level.name}`}>—</span>}
                        </td>
                      );
                    })}
                    {onEdit && (
                      <td className="tr-row-actions">
                        <Button size="small" variant="minimal" icon={<EditIcon />} text="Edit" aria-label={`Edit ${service.name}`} onClick={() => onEdit(service)} />
                      </td>
                    )}
                  </tr>
                ))}
            </Fragment>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
