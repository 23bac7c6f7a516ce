import { Callout, FormGroup, HTMLTable, InputGroup, Intent, Tag } from '@blueprintjs/core';
import { InfoSignIcon } from '@blueprintjs/icons';
import type { CommissionSample } from '@tressury/domain';
import { moneyText, percentText, type PreviewOutcome, type TierMode } from './plan-terms-values';

export type SampleValues = { serviceRevenue: string; colourRevenue: string; colourServices: string; colourProductCost: string; retailSales: string };

// Invented figures for a busy stylist's fortnight; the owner types their own.
export const sampleStart: SampleValues = { serviceRevenue: '6000', colourRevenue: '2500', colourServices: '10', colourProductCost: '300', retailSales: '400' };

const WHOLE = /^\d+$/;

export function sampleOf(values: SampleValues): CommissionSample {
  const trimmed = (text: string) => text.trim() || '0';
  return {
    serviceRevenue: trimmed(values.serviceRevenue),
    colourRevenue: trimmed(values.colourRevenue),
    colourServices: WHOLE.test(values.colourServices.trim() || '0') ? Number(values.colourServices.trim() || '0') : Number.NaN,
    colourProductCost: trimmed(values.colourProductCost),
    retailSales: trimmed(values.retailSales),
  };
}

const sampleFields: { key: keyof SampleValues; label: string }[] = [
  { key: 'serviceRevenue', label: 'Service revenue in the period' },
  { key: 'colourRevenue', label: 'of which colour services' },
  { key: 'colourServices', label: 'Colour services (count)' },
  { key: 'colourProductCost', label: 'Colour product used, at cost' },
  { key: 'retailSales', label: 'Retail sales' },
];

const sampleProblem = (message: string, key: string) => message.replace(`sample.${key}`, 'This figure');

type Props = {
  sample: SampleValues;
  onSampleChange: (sample: SampleValues) => void;
  outcome: PreviewOutcome;
  tierMode: TierMode;
  /** Why there is no preview yet, when the terms themselves are incomplete. */
  waiting: string | null;
};

/** What the terms would pay on a sample period, recomputed with every keystroke by the payroll's own rules. */
export function TierPreview({ sample, onSampleChange, outcome, tierMode, waiting }: Props) {
  const { preview, problems } = outcome;
  const reached = preview ? preview.tierBreakdown.reduce((top, row, i) => (row.base !== '0.00' ? i : top), 0) : -1;
  return (
    <section className="tr-plan-preview" aria-labelledby="plan-preview-title">
      <h3 id="plan-preview-title" className="tr-plan-preview-title">
        Preview on a sample period
      </h3>
      <div className="tr-plan-sample">
        {sampleFields.map(({ key, label }) => {
          const problem = problems[`sample.${key}`];
          return (
            <FormGroup
              key={key}
              className="tr-plan-sample-field"
              label={label}
              labelFor={`plan-sample-${key}`}
              intent={problem ? Intent.DANGER : Intent.NONE}
              helperText={problem ? <span id={`plan-sample-${key}-help`}>{sampleProblem(problem, key)}</span> : undefined}
            >
              <InputGroup
                id={`plan-sample-${key}`}
                className="tr-plan-sample-input"
                inputMode={key === 'colourServices' ? 'numeric' : 'decimal'}
                intent={problem ? Intent.DANGER : Intent.NONE}
                aria-invalid={problem ? true : undefined}
                aria-describedby={problem ? `plan-sample-${key}-help` : undefined}
                value={sample[key]}
                onValueChange={(value) => onSampleChange({ ...sample, [key]: value })}
              />
            </FormGroup>
          );
        })}
      </div>
      {preview ? (
        <HTMLTable compact className="tr-table tr-plan-preview-table" aria-label="Commission on the sample">
          <thead>
            <tr>
              <th scope="col">Tier</th>
              <th scope="col" className="tr-figure">
                Rate
              </th>
              <th scope="col" className="tr-figure">
                Revenue in tier
              </th>
              <th scope="col" className="tr-figure">
                Commission
              </th>
            </tr>
          </thead>
          <tbody>
            {preview.tierBreakdown.map((row, i) => (
              <tr key={row.from}>
                <th scope="row">
                  {row.to === null ? `${moneyText(row.from)} and over` : `${moneyText(row.from)} – ${moneyText(row.to)}`}
                  {tierMode === 'whole-period' && i === reached && (
                    <Tag minimal intent={Intent.PRIMARY} className="tr-plan-reached">
                      reached: all revenue at this rate
                    </Tag>
                  )}
                </th>
                <td className="tr-figure">{percentText(row.rate)}</td>
                <td className="tr-figure">{moneyText(row.base)}</td>
                <td className="tr-figure">{moneyText(row.commission)}</td>
              </tr>
            ))}
          </tbody>
          <tbody className="tr-plan-preview-sums">
            <tr>
              <th scope="row" colSpan={3}>
                Service revenue
              </th>
              <td className="tr-figure">{moneyText(preview.serviceRevenue)}</td>
            </tr>
            <tr>
              <th scope="row" colSpan={3}>
                less colour product charge
              </th>
              <td className="tr-figure">{moneyText(preview.productCharge)}</td>
            </tr>
            <tr>
              <th scope="row" colSpan={3}>
                Commissionable revenue
              </th>
              <td className="tr-figure">{moneyText(preview.commissionableRevenue)}</td>
            </tr>
            <tr>
              <th scope="row" colSpan={3}>
                Service commission
              </th>
              <td className="tr-figure">{moneyText(preview.serviceCommission)}</td>
            </tr>
            <tr>
              <th scope="row" colSpan={3}>
                Retail commission
              </th>
              <td className="tr-figure">{moneyText(preview.retailCommission)}</td>
            </tr>
            <tr className="tr-plan-preview-total">
              <th scope="row" colSpan={3}>
                Total commission
              </th>
              <td className="tr-figure">{moneyText(preview.totalCommission)}</td>
            </tr>
          </tbody>
        </HTMLTable>
      ) : (
        <p className="tr-muted tr-plan-preview-waiting">{waiting ?? 'Correct the marked figures to see the preview.'}</p>
      )}
      <Callout intent={Intent.NONE} icon={<InfoSignIcon />} className="tr-plan-note" role="note">
        Hourly pay, tips, minimum-wage top-ups and overtime depend on the hours worked and are not in this preview. The figures follow the configured
        rules and are to be confirmed by a payroll professional.
      </Callout>
    </section>
  );
}
