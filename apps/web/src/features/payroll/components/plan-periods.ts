import { businessDateText } from '../../../lib/business-date';
import type { PayPeriods, PayPlan, PayPlanVersion } from '../api/pay-plan-queries';

export type PeriodChoice = { startDate: string; endDate: string; label: string };

const frozen = (status: string | null) => status === 'approved' || status === 'exported';

/**
 * The pay periods new terms or an assignment may start from: the stored ones, the current and the next, but
 * none on or before a period whose payroll was approved — approved runs keep the terms they were computed with.
 */
export function periodChoices(calendar: PayPeriods): PeriodChoice[] {
  const lastFrozen = calendar.periods.filter((p) => frozen(p.runStatus)).reduce<string>((latest, p) => (p.startDate > latest ? p.startDate : latest), '');
  const byStart = new Map<string, { startDate: string; endDate: string; note: string[] }>();
  for (const p of calendar.periods) {
    byStart.set(p.startDate, { startDate: p.startDate, endDate: p.endDate, note: p.runStatus === 'draft' ? ['draft payroll run'] : [] });
  }
  for (const [range, note] of [
    [calendar.current, 'current period'],
    [calendar.next, 'next period'],
  ] as const) {
    if (!range || (note === 'next period' && range.startDate === calendar.current?.startDate)) continue;
    const known = byStart.get(range.startDate) ?? { ...range, note: [] };
    known.note.unshift(note);
    byStart.set(range.startDate, known);
  }
  return [...byStart.values()]
    .filter((p) => p.startDate > lastFrozen)
    .sort((a, b) => a.startDate.localeCompare(b.startDate))
    .map((p) => ({
      startDate: p.startDate,
      endDate: p.endDate,
      label: `${businessDateText(p.startDate)} – ${businessDateText(p.endDate)}${p.note.length > 0 ? ` (${p.note.join(', ')})` : ''}`,
    }));
}

/** The day the "now" of the plans list is taken from: the first day of the period holding today. */
export const referenceDate = (calendar: PayPeriods): string | null => calendar.current?.startDate ?? null;

/** The version in force on `date` (the latest starting on or before it), else the earliest. */
export function versionOn(plan: PayPlan, date: string | null): PayPlanVersion | undefined {
  const started = date === null ? [] : plan.versions.filter((v) => v.effectiveFrom <= date);
  return started.at(-1) ?? plan.versions[0];
}

export type Placement = { planId: string; planName: string; effectiveFrom: string };
export type StaffPlacement = { current: Placement | null; upcoming: Placement[] };

/**
 * Which plan each staff member is paid by on `date`, and the changes booked after it: the latest assignment on or
 * before the date wins, whichever plan it is on — as the payroll run reads them.
 */
export function placements(plans: PayPlan[], date: string | null): Map<string, StaffPlacement> {
  const all = plans
    .flatMap((plan) => plan.assignments.map((a) => ({ staffId: a.staffId, planId: plan.id, planName: plan.name, effectiveFrom: a.effectiveFrom })))
    .sort((a, b) => a.effectiveFrom.localeCompare(b.effectiveFrom));
  const result = new Map<string, StaffPlacement>();
  for (const { staffId, ...placement } of all) {
    const entry = result.get(staffId) ?? { current: null, upcoming: [] };
    if (date !== null && placement.effectiveFrom <= date) entry.current = placement;
    else entry.upcoming.push(placement);
    result.set(staffId, entry);
  }
  return result;
}
