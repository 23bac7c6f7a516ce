import { Intent, Tag } from '@blueprintjs/core';
import { ArrowUpIcon, TimeIcon, TrendingDownIcon, WarningSignIcon } from '@blueprintjs/icons';
import type { ReactElement } from 'react';
import { type FlagKind, flagLabels } from './review-figures';

const looks: Record<FlagKind, { icon: ReactElement; intent: Intent }> = {
  'top-up': { icon: <ArrowUpIcon />, intent: Intent.WARNING },
  overtime: { icon: <TimeIcon />, intent: Intent.PRIMARY },
  'negative-commission': { icon: <TrendingDownIcon />, intent: Intent.DANGER },
  'no-hours': { icon: <WarningSignIcon />, intent: Intent.WARNING },
};

/** Each flag as an icon and its words (never colour alone), with the meaning on hover and for screen readers. */
export function ReviewFlags({ flags }: { flags: FlagKind[] }) {
  if (flags.length === 0) return null;
  return (
    <span className="tr-review-flags">
      {flags.map((flag) => (
        <Tag key={flag} minimal intent={looks[flag].intent} icon={looks[flag].icon} title={flagLabels[flag].meaning}>
          {flagLabels[flag].label}
        </Tag>
      ))}
    </span>
  );
}
