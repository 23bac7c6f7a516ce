import { Button, Callout, H1, H2, Intent, NonIdealState, useHotkeys } from '@blueprintjs/core';
import { PlusIcon, TimelineLineChartIcon, WarningSignIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { data, type LoaderFunctionArgs } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { businessDateIn, businessDateText } from '../../../lib/business-date';
import { requireUser, useSessionUser } from '../../../lib/session';
import { type PayPlan, payPlanQueries } from '../api/pay-plan-queries';
import { PaySchedulePanel } from '../components/pay-schedule-panel';
import { PayrollSections } from '../components/payroll-sections';
import { PlanAssignDialog } from '../components/plan-assign-dialog';
import { PlanEditor } from '../components/plan-editor';
import { periodChoices, type Placement, placements as placementsOf, referenceDate, versionOn } from '../components/plan-periods';
import { PlanTable } from '../components/plan-table';
import '../components/plan-editor.css';

export function payPlansLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'PayPlan')) throw data({ message: 'Pay plans are for the owner and the accountant.' }, { status: 403 });
    await Promise.all([
      queryClient.ensureQueryData(payPlanQueries.list()),
      queryClient.ensureQueryData(payPlanQueries.periods()),
      queryClient.ensureQueryData(payPlanQueries.staff()),
    ]);
    return null;
  };
}

const joinsText = (next: Placement | undefined) => (next ? ` (${next.planName} from ${businessDateText(next.effectiveFrom)})` : '');

type Editing = { plan?: PayPlan; readOnly: boolean } | null;

export function PayPlansRoute() {
  const { data: plans } = useSuspenseQuery(payPlanQueries.list());
  const { data: calendar } = useSuspenseQuery(payPlanQueries.periods());
  const { data: staff } = useSuspenseQuery(payPlanQueries.staff());
  const ability = useAbility();
  const user = useSessionUser();
  const [editing, setEditing] = useState<Editing>(null);
  const [assigning, setAssigning] = useState<PayPlan | null>(null);

  const canEdit = ability.can('update', 'PayPlan');
  const canCreate = ability.can('create', 'PayPlan');
  const date = referenceDate(calendar);
  const choices = useMemo(() => periodChoices(calendar), [calendar]);
  const placements = useMemo(() => placementsOf(plans, date), [plans, date]);
  const staffById = useMemo(() => new Map(staff.map((s) => [s.id, s])), [staff]);
  const unplaced = staff.filter((s) => s.active && !placements.get(s.id)?.current).sort((a, b) => a.displayName.localeCompare(b.displayName));
  const today = businessDateIn(user?.branches[0]?.timeZone ?? 'UTC');
  const mayStart = calendar.schedule !== null && choices.length > 0;

  const startOf = (preferred: string | undefined) => (choices.some((c) => c.startDate === preferred) ? preferred! : (choices[0]?.startDate ?? ''));
  const newPlan = () => setEditing({ readOnly: false });

  const hotkeys = useMemo(() => (canCreate && mayStart ? [{ combo: 'n', global: true, label: 'New pay plan', onKeyDown: newPlan }] : []), [canCreate, mayStart]);
  useHotkeys(hotkeys);

  const newPlanButton = (text = 'New plan') =>
    canCreate ? <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text={text} disabled={!mayStart} onClick={newPlan} /> : undefined;

  return (
    <section className="tr-page tr-plans-page">
      <PayrollSections />
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Pay plans</H1>
          <p className="tr-muted">Commission tiers, the colour product charge, retail and hourly rates — and who is paid by which plan.</p>
        </div>
        {plans.length > 0 && newPlanButton()}
      </header>
      <div className="tr-plan-panels">
        <PaySchedulePanel calendar={calendar} canEdit={ability.can('update', 'PaySchedule')} today={today} />
        <section aria-labelledby="plans-title">
          <H2 id="plans-title" className="tr-visually-hidden">
            Plans
          </H2>
          {plans.length === 0 ? (
            <NonIdealState
              icon={<TimelineLineChartIcon />}
              title="No pay plans yet"
              description={
                calendar.schedule === null
                  ? 'Set the pay schedule first: a plan’s terms start on the first day of a pay period.'
                  : 'A plan holds the commission tiers, the colour product charge and the retail and hourly rates. Each staff member is paid by the plan they are on.'
              }
              action={newPlanButton('Create the first plan')}
            />
          ) : (
            <>
              <PlanTable
                plans={plans}
                staff={staffById}
                placements={placements}
                date={date}
                canEdit={canEdit}
                onChangeTerms={(plan) => setEditing({ plan, readOnly: false })}
                onShowTerms={(plan) => setEditing({ plan, readOnly: true })}
                onAssign={setAssigning}
              />
              {unplaced.length > 0 && (
                <Callout intent={Intent.WARNING} icon={<WarningSignIcon />} className="tr-plan-unplaced" title={`On no plan now (${unplaced.length})`}>
                  {unplaced.map((s) => s.displayName + joinsText(placements.get(s.id)?.upcoming[0])).join(', ')}. Their service and retail sales earn no commission
                  until they are on a plan.
                </Callout>
              )}
            </>
          )}
        </section>
      </div>
      <PlanEditor
        isOpen={editing !== null}
        plan={editing?.plan}
        startFrom={editing?.plan ? versionOn(editing.plan, date) : undefined}
        readOnly={editing?.readOnly ?? true}
        choices={choices}
        defaultStart={startOf(editing?.plan ? (calendar.next?.startDate ?? undefined) : undefined)}
        onClose={() => setEditing(null)}
      />
      <PlanAssignDialog
        isOpen={assigning !== null}
        plan={assigning}
        staff={staff}
        placements={placements}
        choices={choices}
        defaultStart={startOf(calendar.current?.startDate)}
        onClose={() => setAssigning(null)}
      />
    </section>
  );
}
