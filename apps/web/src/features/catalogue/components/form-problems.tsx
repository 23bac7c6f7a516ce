import { FormGroup, Intent } from '@blueprintjs/core';
import { type ReactNode, useEffect, useRef, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';

export type FieldA11y = { id: string; 'aria-describedby': string; 'aria-invalid': true | undefined };

/**
 * The server's refusal of a form: each `details[].field` under the field it names (through `fieldOf`), focus on
 * the first of them, and the message itself when it names no field on the form.
 */
export function useFormProblems<F extends string>(order: readonly F[], idOf: (field: F) => string) {
  const [problems, setProblems] = useState<Partial<Record<F, string>>>({});
  const [refusal, setRefusal] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const justRefused = useRef(false);

  // Only right after a refusal: fixing one field must not pull focus to another.
  useEffect(() => {
    if (!justRefused.current) return;
    justRefused.current = false;
    const first = order.find((name) => problems[name]);
    if (first) formRef.current?.querySelector<HTMLElement>(`#${idOf(first)}`)?.focus();
  }, [problems, order, idOf]);

  const clear = (field: F) =>
    setProblems((current) => {
      if (!(field in current)) return current;
      const rest = { ...current };
      delete rest[field];
      return rest;
    });

  const refused = (error: unknown, fieldOf: (serverField: string) => F | null) => {
    const onFields: Partial<Record<F, string>> = {};
    if (error instanceof ApiError) {
      for (const { field, message } of error.details) {
        const mine = fieldOf(field);
        if (mine) onFields[mine] = onFields[mine] ? `${onFields[mine]} ${message}` : message;
      }
    }
    if (Object.keys(onFields).length > 0) {
      justRefused.current = true;
      setProblems(onFields);
      setRefusal(null);
    } else setRefusal(errorMessage(error));
  };

  return { problems, refusal, formRef, clear, refused };
}

type FieldProps = { id: string; label: ReactNode; hint?: ReactNode; problem?: string; className?: string; children: (a11y: FieldA11y) => ReactNode };

/** A labelled control with its hint, or the server's problem with it in the hint's place. */
export function Field({ id, label, hint, problem, className, children }: FieldProps) {
  const helpId = `${id}-help`;
  return (
    <FormGroup className={className} label={label} labelFor={id} intent={problem ? Intent.DANGER : Intent.NONE} helperText={<span id={helpId}>{problem ?? hint}</span>}>
      {children({ id, 'aria-describedby': helpId, 'aria-invalid': problem ? true : undefined })}
    </FormGroup>
  );
}
