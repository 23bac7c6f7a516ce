import { Button, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { EditIcon } from '@blueprintjs/icons';
import { Fragment } from 'react';
import type { StaffMember } from '../api/staff-queries';

type Props = { staff: StaffMember[]; onEdit?: (member: StaffMember) => void; editable: (member: StaffMember) => boolean };

/**
 * Staff by home branch. The hourly rate is a pay figure the server sends only to those who may see it:
 * no column at all when no row carries one.
 */
export function StaffTable({ staff, onEdit, editable }: Props) {
  const branches = [...new Map(staff.map((s) => [s.homeBranchId, s.homeBranchName])).entries()].sort((a, b) => a[1].localeCompare(b[1]));
  const showsPay = staff.some((s) => 'hourlyRate' in s);
  const showsActions = onEdit !== undefined && staff.some(editable);
  const columns = 5 + (showsPay ? 1 : 0) + (showsActions ? 1 : 0);
  return (
    <div className="tr-table-frame">
      <HTMLTable compact className="tr-table tr-people-table" aria-label="Staff">
        <thead>
          <tr>
            <th scope="col">Name</th>
            <th scope="col">Level</th>
            <th scope="col">E-mail</th>
            <th scope="col">Sign-in</th>
            <th scope="col">Status</th>
            {showsPay && (
              <th scope="col" className="tr-figure">
                Hourly rate
              </th>
            )}
            {showsActions && (
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {branches.map(([branchId, branchName]) => {
            const members = staff.filter((s) => s.homeBranchId === branchId);
            return (
              <Fragment key={branchId}>
                <tr className="tr-people-group">
                  <th scope="colgroup" colSpan={columns}>
                    {branchName} <span className="tr-muted">· {members.filter((m) => m.active).length} active</span>
                  </th>
                </tr>
                {members.map((member) => (
                  <tr key={member.id} className={member.active ? undefined : 'tr-people-left'}>
                    <td className="tr-row-head">{member.displayName}</td>
                    <td className="tr-nowrap">{member.levelName}</td>
                    <td>{member.email ?? <span className="tr-muted">—</span>}</td>
                    <td className="tr-nowrap">{member.userId ? 'Linked' : <span className="tr-muted">None</span>}</td>
                    <td>{member.active ? <span>Active</span> : <Tag minimal intent={Intent.WARNING}>Left</Tag>}</td>
                    {showsPay && (
                      <td className="tr-figure">
                        {!('hourlyRate' in member) ? (
                          <span className="tr-muted" title="Not shown to your role">
                            —
                          </span>
                        ) : member.hourlyRate === null ? (
                          <span className="tr-muted">None</span>
                        ) : (
                          member.hourlyRate
                        )}
                      </td>
                    )}
                    {showsActions && (
                      <td className="tr-row-actions">
                        {editable(member) && (
                          <Button
                            size="small"
                            variant="minimal"
                            icon={<EditIcon />}
                            text="Edit"
                            aria-label={`Edit ${member.displayName}`}
                            onClick={() => onEdit?.(member)}
                          />
                        )}
                      </td>
                    )}
                  </tr>
                ))}
              </Fragment>
            );
          })}
        </tbody>
      </HTMLTable>
      {showsPay && staff.some((s) => !('hourlyRate' in s)) && (
        <p className="tr-muted tr-people-table-note">Hourly rates show only where your role may see them; a dash marks one that is not shown to you.</p>
      )}
    </div>
  );
}
