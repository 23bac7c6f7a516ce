import { H1, NonIdealState } from '@blueprintjs/core';
import { CalendarIcon, DocumentIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { requireUser } from '../../../lib/session';
import { earningsQueries, type MyEarnings } from '../api/earnings-queries';
import { DailyChart } from '../components/daily-chart';
import { EarningsFigures } from '../components/earnings-figures';
import { dayText, periodText } from '../components/earnings-format';
import { EarningsPayNote } from '../components/earnings-pay-note';
import { StatementsTable } from '../components/statements-table';
import { TierBreakdown } from '../components/tier-breakdown';
import { TierProgressPanel } from '../components/tier-progress-panel';
import '../components/earnings.css';

export function earningsLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!user.staffId || !abilityFor(user).can('read', 'StaffPay')) {
      throw data({ message: 'Earnings are shown to staff members, for their own work.' }, { status: 404 });
    }
    await queryClient.ensureQueryData(earningsQueries.mine());
    return null;
  };
}

function subtitle(earnings: MyEarnings): string {
  const who = `${earnings.staffName} · ${earnings.branch.name}`;
  if (!earnings.period) return who;
  const period = `pay period ${periodText(earnings.period.startDate, earnings.period.endDate)}`;
  const through = earnings.throughDate ? `figures through ${dayText(earnings.throughDate)}, closed days only` : 'no day closed yet';
  return `${who} · ${period} · ${through}`;
}

function Missing({ earnings }: { earnings: MyEarnings }) {
  if (earnings.missing.includes('pay_schedule')) {
    return (
      <NonIdealState
        icon={<CalendarIcon />}
        title="No pay schedule yet"
        description="The owner sets how often staff are paid. Your figures for the pay period show here once that is done."
      />
    );
  }
  return (
    <NonIdealState
      icon={<DocumentIcon />}
      title="No pay plan for this pay period"
      description="Your commission is worked out from a pay plan, and none is set for you from this period’s first day. Ask the owner to put you on one."
    />
  );
}

export function EarningsRoute() {
  const { data: earnings } = useSuspenseQuery(earningsQueries.mine());
  const currency = earnings.branch.currency;
  const { figures, plan, nextTier } = earnings;
  return (
    <section className="tr-page tr-earnings-page">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Earnings</H1>
          <p className="tr-muted">{subtitle(earnings)}</p>
        </div>
      </header>
      <EarningsPayNote />
      {figures && plan ? (
        <>
          {nextTier && <TierProgressPanel progress={nextTier} currency={currency} tierMode={plan.tierMode} />}
          <EarningsFigures figures={figures} currency={currency} retailRate={plan.retailRate} />
          <TierBreakdown figures={figures} currency={currency} tierMode={plan.tierMode} currentTier={nextTier?.currentTier.index ?? null} />
          {earnings.days.length > 0 ? (
            <DailyChart days={earnings.days} currency={currency} />
          ) : (
            <NonIdealState icon={<CalendarIcon />} title="No closed days yet" description="Each day’s figures appear here once the salon closes that day." />
          )}
        </>
      ) : (
        <Missing earnings={earnings} />
      )}
      <StatementsTable statements={earnings.statements} currency={currency} />
    </section>
  );
}
