import { Alert, Button, Callout, Intent } from '@blueprintjs/core';
import { EnvelopeIcon } from '@blueprintjs/icons';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { type SentStatements, useSendStatements } from '../api/use-send-statements';

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Sends an approved run's statements by e-mail and says how many went and which did not, and why. */
export function RunStatements({ runId, staff, names }: { runId: string; staff: number; names: Map<string, string> }) {
  const send = useSendStatements();
  const [asking, setAsking] = useState(false);
  const [outcome, setOutcome] = useState<SentStatements | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const failed = outcome?.messages.filter((m) => m.status === 'failed') ?? [];

  const confirm = () =>
    send.mutate(runId, {
      onSuccess: (result) => {
        setAsking(false);
        setProblem(null);
        setOutcome(result);
      },
      onError: (error) => {
        setAsking(false);
        setProblem(errorMessage(error));
      },
    });

  return (
    <div className="tr-run-statements">
      <Button icon={<EnvelopeIcon />} text="Send statements…" onClick={() => setAsking(true)} />
      <Alert
        isOpen={asking}
        icon={<EnvelopeIcon />}
        intent={Intent.PRIMARY}
        confirmButtonText="Send statements"
        cancelButtonText="Not now"
        loading={send.isPending}
        onConfirm={confirm}
        onCancel={() => setAsking(false)}
        canEscapeKeyCancel
      >
        <p>
          E-mail each of the {count(staff, 'staff member', 'staff members')} their own statement for this period, with their workbook attached? Every message is
          kept in the outbox. Sending again sends everyone a fresh copy.
        </p>
      </Alert>
      {problem && (
        <Callout className="tr-run-statement-outcome" intent={Intent.DANGER} role="alert" title="No statements were sent">
          {problem}
        </Callout>
      )}
      {outcome && (
        <Callout
          className="tr-run-statement-outcome"
          intent={outcome.failed > 0 ? Intent.WARNING : Intent.SUCCESS}
          role="status" title={`Statements: ${outcome.sent} sent, ${outcome.failed} failed`}>
          {failed.length > 0 && (
            <ul className="tr-run-statement-failures">
              {failed.map((message) => (
                <li key={message.id}>
                  {(message.recipientStaffId && names.get(message.recipientStaffId)) || message.recipient || 'Unknown recipient'}: {message.error ?? 'not sent'}
                </li>
              ))}
            </ul>
          )}
        </Callout>
      )}
    </div>
  );
}
