import { Button, Callout, Dialog, DialogBody, DialogFooter, InputGroup, Intent } from '@blueprintjs/core';
import { type FormEvent, useState } from 'react';
import { showToast } from '../../../lib/toaster';
import type { Level } from '../api/catalogue-queries';
import { useCreateLevel } from '../api/use-create-level';
import { useUpdateLevel } from '../api/use-update-level';
import { Field, useFormProblems } from './form-problems';

type LevelField = 'name' | 'rank';
const order: LevelField[] = ['name', 'rank'];
const idOf = (field: LevelField) => `level-${field}`;
const fieldOf = (field: string): LevelField | null => (order.includes(field as LevelField) ? (field as LevelField) : null);

type Props = { isOpen: boolean; level?: Level; nextRank: number; onClose: () => void };

export function LevelFormDialog({ isOpen, level, nextRank, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={level ? `Edit level ${level.name}` : 'New stylist level'} className="tr-catalogue-dialog-narrow">
      {isOpen && <LevelForm key={level?.id ?? 'new'} level={level} nextRank={nextRank} onDone={onClose} />}
    </Dialog>
  );
}

function LevelForm({ level, nextRank, onDone }: { level?: Level; nextRank: number; onDone: () => void }) {
  const create = useCreateLevel();
  const update = useUpdateLevel();
  const { problems, refusal, formRef, clear, refused } = useFormProblems(order, idOf);
  const [name, setName] = useState(level?.name ?? '');
  const [rank, setRank] = useState(String(level?.rank ?? nextRank));
  const pending = create.isPending || update.isPending;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const values = { name: name.trim(), rank: Number(rank) };
    const onError = (error: unknown) => refused(error, fieldOf);
    if (!level) {
      create.mutate(values, {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Level ${saved.name} added.` });
          onDone();
        },
        onError,
      });
      return;
    }
    const changes = { ...(values.name !== level.name ? { name: values.name } : {}), ...(values.rank !== level.rank ? { rank: values.rank } : {}) };
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { id: level.id, changes },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Level ${saved.name} saved.` });
          onDone();
        },
        onError,
      },
    );
  };

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody>
        <Field id={idOf('name')} label="Name" hint="Such as Junior or Senior; unique in the business." problem={problems.name}>
          {(a11y) => (
            <InputGroup
              {...a11y}
              autoFocus
              intent={problems.name ? Intent.DANGER : Intent.NONE}
              value={name}
              onValueChange={(value) => {
                setName(value);
                clear('name');
              }}
            />
          )}
        </Field>
        <Field id={idOf('rank')} label="Rank" hint="1 is the most junior; menu prices are listed in this order." problem={problems.rank}>
          {(a11y) => (
            <InputGroup
              {...a11y}
              inputMode="numeric"
              className="tr-catalogue-short-input"
              intent={problems.rank ? Intent.DANGER : Intent.NONE}
              value={rank}
              onValueChange={(value) => {
                setRank(value);
                clear('rank');
              }}
            />
          )}
        </Field>
        {refusal && (
          <Callout intent={Intent.DANGER} role="alert">
            {refusal}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={pending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={level ? 'Save changes' : 'Add level'} />
          </>
        }
      />
    </form>
  );
}
