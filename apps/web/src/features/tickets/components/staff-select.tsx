import { HTMLSelect } from '@blueprintjs/core';
import type { StaffMember } from '../api/picker-queries';

type Props = {
  id: string;
  staff: StaffMember[];
  value: string;
  onChange: (staffId: string) => void;
  /** The first, empty choice, e.g. "Choose a stylist" or "No assistant". */
  emptyLabel: string;
  disabled?: boolean;
  invalid?: boolean;
  describedBy?: string;
  showLevel?: boolean;
};

export function StaffSelect({ id, staff, value, onChange, emptyLabel, disabled, invalid, describedBy, showLevel }: Props) {
  return (
    <HTMLSelect
      id={id}
      fill
      value={value}
      disabled={disabled}
      aria-invalid={invalid || undefined}
      aria-describedby={describedBy}
      className={invalid ? 'tr-invalid-select' : undefined}
      onChange={(event) => onChange(event.currentTarget.value)}
    >
      <option value="">{emptyLabel}</option>
      {staff.map((member) => (
        <option key={member.id} value={member.id}>
          {showLevel ? `${member.displayName} · ${member.levelName}` : member.displayName}
        </option>
      ))}
    </HTMLSelect>
  );
}
