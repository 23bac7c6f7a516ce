import { H2, Intent, ProgressBar } from '@blueprintjs/core';
import { parseDecimal } from '@tressury/domain';
import type { EarningsTierProgress } from '../api/earnings-queries';
import { moneyText, rateText } from './earnings-format';

/** A picture of the way to the next commission tier, with the same facts in words beside it. */
export function TierProgressPanel({ progress, currency, tierMode }: { progress: EarningsTierProgress; currency: string; tierMode: string }) {
  const money = (value: string) => moneyText(value, currency);
  const { currentTier, nextTier } = progress;
  const here = `Tier ${currentTier.index + 1} at ${rateText(currentTier.rate)}`;
  if (!nextTier) {
    return (
      <section className="tr-panel" aria-labelledby="earnings-next-tier">
        <H2 id="earnings-next-tier" className="tr-panel-title">
          Next tier
        </H2>
        <p className="tr-earnings-lead">
          You have reached your plan’s top tier ({here}): all further commissionable revenue this period earns {rateText(currentTier.rate)}.
        </p>
      </section>
    );
  }
  // Whole percent rounded down (Big's mode 0), so the bar never says 100 % before the threshold is reached.
  const percent = parseDecimal(progress.progress, 'progress').times(100).round(0, 0).toFixed();
  const there = `tier ${nextTier.index + 1} at ${rateText(nextTier.rate)}`;
  return (
    <section className="tr-panel" aria-labelledby="earnings-next-tier">
      <H2 id="earnings-next-tier" className="tr-panel-title">
        Next tier
      </H2>
      <p className="tr-earnings-lead">
        <strong className="tr-figure">{money(progress.revenueToNextTier!)}</strong> more service revenue, after the product charge, takes you to {there} and adds{' '}
        <strong className="tr-figure">{money(progress.commissionAdded!)}</strong> to your commission.
      </p>
      {tierMode === 'whole-period' && (
        <p className="tr-muted tr-earnings-explain">
          That includes the lift on what you have already earned: once you reach {money(nextTier.from)}, the whole period is paid at {rateText(nextTier.rate)}.
        </p>
      )}
      <div className="tr-earnings-progress">
        <ProgressBar
          className="tr-earnings-bar"
          value={Number(progress.progress)}
          intent={Intent.PRIMARY}
          stripes={false}
          animate={false}
          aria-label={`Progress from tier ${currentTier.index + 1} to tier ${nextTier.index + 1}`}
          aria-valuetext={`${percent} % of the way from ${money(currentTier.from)} to ${money(nextTier.from)}`}
        />
        <div className="tr-earnings-progress-ends">
          <span>
            {here}, from {money(currentTier.from)}
          </span>
          <span className="tr-figure">{percent} % of the way</span>
          <span>
            Tier {nextTier.index + 1} at {money(nextTier.from)}
          </span>
        </div>
      </div>
    </section>
  );
}
