import { Button, InputGroup, Intent, Tag } from '@blueprintjs/core';
import { PlusIcon, TintIcon, TrashIcon } from '@blueprintjs/icons';
import { developerPercent } from '@tressury/domain';
import { type FormEvent, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { Bowl, ServiceLine } from '../api/ticket-queries';
import { useRemoveBowl } from '../api/use-remove-bowl';
import { useUpdateServiceLine } from '../api/use-update-service-line';
import { fieldProblems } from './field-problems';
import { plainFigure, ratioText, signOf } from './figures';

type Props = {
  ticketId: string;
  line: ServiceLine;
  recordsBowls: boolean;
  explainsNoProduct: boolean;
  onRecordBowl: () => void;
};

/** The bowls mixed for one colour service, or why none was, under its line. */
export function LineBowls({ ticketId, line, recordsBowls, explainsNoProduct, onRecordBowl }: Props) {
  const remove = useRemoveBowl(ticketId);
  const update = useUpdateServiceLine(ticketId);
  const [explaining, setExplaining] = useState(false);
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const waiting = line.bowls.length === 0 && !line.noProductReason;

  const saveReason = (event: FormEvent) => {
    event.preventDefault();
    update.mutate(
      { lineId: line.id, changes: { noProductReason: reason.trim() } },
      {
        onSuccess: () => setExplaining(false),
        onError: (error) => setProblem(fieldProblems(error).noProductReason ?? errorMessage(error)),
      },
    );
  };

  return (
    <div className="tr-line-bowls">
      {line.bowls.length > 0 && (
        <ol className="tr-bowl-list" aria-label={`Bowls for ${line.serviceName}`}>
          {line.bowls.map((bowl, index) => (
            <li key={bowl.id} className="tr-bowl-item">
              <span className="tr-bowl-name">
                <TintIcon /> Bowl {index + 1}
              </span>
              <span className="tr-bowl-recipe">{recipeText(bowl)}</span>
              <span className="tr-bowl-stats">{statsText(bowl)}</span>
              {recordsBowls && (
                <Button
                  size="small"
                  variant="minimal"
                  icon={<TrashIcon />}
                  aria-label={`Remove bowl ${index + 1} of ${line.serviceName}`}
                  loading={remove.isPending && remove.variables === bowl.id}
                  onClick={() => remove.mutate(bowl.id, { onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }) })}
                />
              )}
            </li>
          ))}
        </ol>
      )}
      {line.noProductReason && (
        <p className="tr-no-product">
          <Tag minimal>No product used</Tag> {line.noProductReason}
          {explainsNoProduct && (
            <Button
              size="small"
              variant="minimal"
              text="Clear"
              loading={update.isPending}
              onClick={() => update.mutate({ lineId: line.id, changes: { noProductReason: null } }, { onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }) })}
            />
          )}
        </p>
      )}
      {waiting && (
        <Tag intent={Intent.WARNING} minimal icon={<TintIcon />}>
          Waiting for a bowl
        </Tag>
      )}
      {(recordsBowls || (explainsNoProduct && waiting)) && !explaining && (
        <span className="tr-line-bowl-actions">
          {recordsBowls && !line.noProductReason && <Button size="small" icon={<PlusIcon />} text="Record a bowl" onClick={onRecordBowl} />}
          {explainsNoProduct && waiting && <Button size="small" variant="minimal" text="No product used…" onClick={() => setExplaining(true)} />}
        </span>
      )}
      {explaining && (
        <form className="tr-inline-form" onSubmit={saveReason}>
          <InputGroup
            autoFocus
            className="tr-inline-input"
            size="small"
            aria-label={`Why no product was used for ${line.serviceName}`}
            placeholder="Why no product was used"
            value={reason}
            intent={problem ? Intent.DANGER : Intent.NONE}
            onValueChange={(value) => {
              setReason(value);
              setProblem(null);
            }}
            onKeyDown={(event) => event.key === 'Escape' && setExplaining(false)}
          />
          <Button size="small" type="submit" intent={Intent.PRIMARY} text="Save" loading={update.isPending} disabled={reason.trim() === ''} />
          <Button size="small" variant="minimal" text="Cancel" onClick={() => setExplaining(false)} />
          {problem && <span className="tr-field-problem">{problem}</span>}
        </form>
      )}
    </div>
  );
}

function recipeText(bowl: Bowl): string {
  return bowl.components
    .map((c) => `${plainFigure(c.grams)} g ${c.productName}`)
    .join(' + ');
}

function statsText(bowl: Bowl): string {
  const parts = [`${plainFigure(bowl.totalGrams)} g`, ratioText(bowl.ratio)];
  if (bowl.developerVolume) parts.push(`${plainFigure(bowl.developerVolume)} vol (${plainFigure(developerPercent(bowl.developerVolume))} %)`);
  if (bowl.processingMinutes !== null) parts.push(`${bowl.processingMinutes} min`);
  parts.push(`cost ${bowl.cost}`);
  if (signOf(bowl.wasteGrams) > 0) parts.push(`waste ${plainFigure(bowl.wasteGrams)} g (${bowl.wasteCost})`);
  parts.push(`mixed by ${bowl.mixedByName}`);
  if (bowl.note) parts.push(`“${bowl.note}”`);
  return parts.join(' · ');
}
