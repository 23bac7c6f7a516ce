import { Button, HTMLTable } from '@blueprintjs/core';
import { EditIcon, EyeOpenIcon, PeopleIcon } from '@blueprintjs/icons';
import { businessDateText } from '../../../lib/business-date';
import type { PayPlan, PlanStaffMember } from '../api/pay-plan-queries';
import { type StaffPlacement, versionOn } from './plan-periods';
import { termsLine } from './plan-terms-values';

type Props = {
  plans: PayPlan[];
  staff: Map<string, PlanStaffMember>;
  placements: Map<string, StaffPlacement>;
  /** The first day of the current pay period: "now" for terms and staff. */
  date: string | null;
  canEdit: boolean;
  onChangeTerms: (plan: PayPlan) => void;
  onShowTerms: (plan: PayPlan) => void;
  onAssign: (plan: PayPlan) => void;
};

const nameOf = (staff: Map<string, PlanStaffMember>, id: string) => staff.get(id)?.displayName ?? 'A staff member no longer listed';

/** Each plan with the terms in force now on one line, terms booked for later, and who is paid by it. */
export function PlanTable({ plans, staff, placements, date, canEdit, onChangeTerms, onShowTerms, onAssign }: Props) {
  return (
    <div className="tr-table-frame">
      <HTMLTable compact className="tr-table tr-plan-table" aria-label="Pay plans">
        <thead>
          <tr>
            <th scope="col">Plan</th>
            <th scope="col" className="tr-plan-terms-col">
              Terms now
            </th>
            <th scope="col">Paid by it now</th>
            <th scope="col">
              <span className="tr-visually-hidden">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {plans.map((plan) => {
            const now = versionOn(plan, date);
            const later = plan.versions.filter((v) => date !== null && v.effectiveFrom > date);
            const onItNow = [...placements].filter(([, p]) => p.current?.planId === plan.id).map(([id]) => nameOf(staff, id));
            const joining = [...placements].flatMap(([id, p]) => p.upcoming.filter((u) => u.planId === plan.id).map((u) => ({ id, from: u.effectiveFrom })));
            return (
              <tr key={plan.id}>
                <th scope="row" className="tr-row-head">
                  {plan.name}
                </th>
                <td>
                  {now ? termsLine(now) : <span className="tr-muted">No terms</span>}
                  {now && date !== null && now.effectiveFrom > date && (
                    <span className="tr-muted tr-plan-later">Not in force yet: starts {businessDateText(now.effectiveFrom)}.</span>
                  )}
                  {later
                    .filter((v) => v !== now)
                    .map((v) => (
                      <span key={v.id} className="tr-muted tr-plan-later">
                        From {businessDateText(v.effectiveFrom)}: {termsLine(v)}
                      </span>
                    ))}
                </td>
                <td>
                  {onItNow.length === 0 ? (
                    <span className="tr-muted">Nobody</span>
                  ) : (
                    <span>
                      {onItNow.sort((a, b) => a.localeCompare(b)).join(', ')} <span className="tr-muted">({onItNow.length})</span>
                    </span>
                  )}
                  {joining.map(({ id, from }) => (
                    <span key={`${id}-${from}`} className="tr-muted tr-plan-later">
                      Joins {businessDateText(from)}: {nameOf(staff, id)}
                    </span>
                  ))}
                </td>
                <td className="tr-row-actions">
                  {canEdit ? (
                    <>
                      <Button size="small" variant="minimal" icon={<EditIcon />} text="Change terms" aria-label={`Change terms for ${plan.name}`} onClick={() => onChangeTerms(plan)} />
                      <Button size="small" variant="minimal" icon={<PeopleIcon />} text="Put staff on it" aria-label={`Put staff on ${plan.name}`} onClick={() => onAssign(plan)} />
                    </>
                  ) : (
                    <Button size="small" variant="minimal" icon={<EyeOpenIcon />} text="Terms & preview" aria-label={`Terms of ${plan.name}`} onClick={() => onShowTerms(plan)} />
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}
