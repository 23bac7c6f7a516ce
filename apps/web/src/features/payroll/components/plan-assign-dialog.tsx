import { Button, Callout, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, Intent } from '@blueprintjs/core';
import { type FormEvent, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { businessDateText } from '../../../lib/business-date';
import { showToast } from '../../../lib/toaster';
import type { PayPlan, PlanStaffMember } from '../api/pay-plan-queries';
import { useAssignPayPlan } from '../api/use-assign-pay-plan';
import type { PeriodChoice, StaffPlacement } from './plan-periods';

type Props = {
  isOpen: boolean;
  plan: PayPlan | null;
  staff: PlanStaffMember[];
  placements: Map<string, StaffPlacement>;
  choices: PeriodChoice[];
  defaultStart: string;
  onClose: () => void;
};

export function PlanAssignDialog({ isOpen, plan, onClose, ...rest }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={plan ? `Put staff on ${plan.name}` : 'Put staff on a plan'} className="tr-assign-dialog">
      {isOpen && plan && <AssignForm key={plan.id} plan={plan} onDone={onClose} {...rest} />}
    </Dialog>
  );
}

type Failure = { staffId: string; message: string };

function AssignForm({ plan, staff, placements, choices, defaultStart, onDone }: Omit<Props, 'isOpen' | 'onClose' | 'plan'> & { plan: PayPlan; onDone: () => void }) {
  const assign = useAssignPayPlan();
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const [effectiveFrom, setEffectiveFrom] = useState(defaultStart);
  const [failures, setFailures] = useState<Failure[]>([]);
  const [missing, setMissing] = useState(false);
  const [sending, setSending] = useState(false);

  const active = staff.filter((s) => s.active);
  const branches = [...new Map(active.map((s) => [s.homeBranchId, s.homeBranchName])).entries()].sort((a, b) => a[1].localeCompare(b[1]));
  const failureOf = (id: string) => failures.find((f) => f.staffId === id)?.message;

  const toggle = (id: string, on: boolean) => {
    setChosen((current) => {
      const next = new Set(current);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
    setMissing(false);
  };

  const describe = (id: string): string => {
    const placement = placements.get(id);
    const now = placement?.current;
    const nowText = now ? (now.planId === plan.id ? `on ${plan.name} now` : `on ${now.planName} now`) : 'on no plan: earns no commission';
    const later = placement?.upcoming.map((u) => `${u.planName} from ${businessDateText(u.effectiveFrom)}`) ?? [];
    return later.length > 0 ? `${nowText}; then ${later.join(', ')}` : nowText;
  };

  // One request per person: each assignment stands alone, so one refusal leaves the others in place.
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (chosen.size === 0) {
      setMissing(true);
      return;
    }
    setSending(true);
    const failed: Failure[] = [];
    let placed = 0;
    for (const staffId of chosen) {
      try {
        await assign.mutateAsync({ planId: plan.id, assignment: { staffId, effectiveFrom } });
        placed += 1;
      } catch (error) {
        failed.push({ staffId, message: errorMessage(error) });
      }
    }
    setSending(false);
    const when = businessDateText(effectiveFrom);
    if (placed > 0) void showToast({ intent: Intent.SUCCESS, message: `${placed === 1 ? 'One staff member' : `${placed} staff`} on ${plan.name} from ${when}.` });
    if (failed.length === 0) return onDone();
    setFailures(failed);
    setChosen(new Set(failed.map((f) => f.staffId)));
  };

  return (
    <form onSubmit={(event) => void submit(event)} noValidate>
      <DialogBody>
        <FormGroup
          label="From the pay period"
          labelFor="assign-start"
          helperText="They are paid by this plan from the first day of this period until another plan is set for them. Approved payroll runs keep the figures they were approved with."
        >
          <HTMLSelect id="assign-start" fill value={effectiveFrom} onChange={(event) => setEffectiveFrom(event.currentTarget.value)}>
            {choices.map((choice) => (
              <option key={choice.startDate} value={choice.startDate}>
                {choice.label}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <div className="tr-assign-list" role="group" aria-label="Staff" aria-describedby={missing ? 'assign-missing' : undefined}>
          {branches.map(([branchId, branchName]) => (
            <fieldset key={branchId}>
              <legend>{branchName}</legend>
              {active
                .filter((s) => s.homeBranchId === branchId)
                .map((member) => {
                  const failure = failureOf(member.id);
                  return (
                    <Checkbox
                      key={member.id}
                      className="tr-assign-check"
                      checked={chosen.has(member.id)}
                      onChange={(event) => toggle(member.id, event.currentTarget.checked)}
                      labelElement={
                        <span>
                          {member.displayName} <span className="tr-assign-now">— {describe(member.id)}</span>
                          {failure && <span className="tr-tier-problem tr-assign-failure"> {failure}</span>}
                        </span>
                      }
                    />
                  );
                })}
            </fieldset>
          ))}
          {active.length === 0 && <p className="tr-muted">No active staff yet: add them under People first.</p>}
        </div>
        {missing && (
          <p id="assign-missing" className="tr-tier-problem tr-assign-failure" role="alert">
            Tick at least one staff member.
          </p>
        )}
        {failures.length > 0 && (
          <Callout intent={Intent.DANGER} role="alert">
            {failures.length === 1 ? 'One staff member was not put on the plan' : `${failures.length} staff were not put on the plan`}; the reason is beside each name.
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={sending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={sending} text={chosen.size > 1 ? `Put ${chosen.size} on ${plan.name}` : `Put on ${plan.name}`} />
          </>
        }
      />
    </form>
  );
}
