import { Button, Callout, Dialog, DialogBody, DialogFooter, InputGroup, Intent, Spinner, Tag } from '@blueprintjs/core';
import { PersonIcon, SearchIcon, WarningSignIcon } from '@blueprintjs/icons';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { type FormEvent, useEffect, useState } from 'react';
import { generatePath, useNavigate } from 'react-router';
import { errorMessage } from '../../../lib/api-error';
import { routePaths } from '../../../lib/route-paths';
import { type Client, todayQueries } from '../api/today-queries';
import { useOpenTicket } from '../api/use-open-ticket';

type Props = { isOpen: boolean; branch: { id: string; name: string }; onClose: () => void };

export function OpenTicketDialog({ isOpen, branch, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={`Open a ticket at ${branch.name}`} className="tr-open-dialog">
      {isOpen && <OpenTicketForm branchId={branch.id} onDone={onClose} />}
    </Dialog>
  );
}

function useSettled(value: string, delayMs: number): string {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

function OpenTicketForm({ branchId, onDone }: { branchId: string; onDone: () => void }) {
  const open = useOpenTicket();
  const navigate = useNavigate();
  const [search, setSearch] = useState('');
  const settled = useSettled(search.trim(), 250);
  const found = useQuery({ ...todayQueries.clients(settled), placeholderData: keepPreviousData });
  const clients = settled.length >= 2 ? (found.data?.items ?? []) : [];

  const start = (client: Client | null) =>
    open.mutate(client ? { branchId, clientId: client.id } : { branchId }, {
      onSuccess: (ticket) => {
        onDone();
        void navigate(generatePath(routePaths.ticket, { ticketId: ticket.id }));
      },
    });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (clients.length === 1 && clients[0]) start(clients[0]);
  };

  return (
    <form onSubmit={submit} noValidate>
      <DialogBody>
        <label className="tr-search-label" htmlFor="open-ticket-search">
          Find the client by name, phone or e-mail
        </label>
        <InputGroup
          id="open-ticket-search"
          autoFocus
          leftIcon={<SearchIcon />}
          rightElement={found.isFetching ? <Spinner size={16} aria-label="Searching" /> : undefined}
          value={search}
          onValueChange={setSearch}
        />
        <div className="tr-client-results" aria-live="polite">
          {settled.length < 2 ? (
            <p className="tr-muted">Type two letters or more.</p>
          ) : found.isError ? (
            <p className="tr-field-problem">{errorMessage(found.error)}</p>
          ) : clients.length === 0 && !found.isFetching ? (
            <p className="tr-muted">No client matches “{settled}”. Open a walk-in ticket, or add the client from Clients first.</p>
          ) : (
            <ul className="tr-client-list" aria-label="Matching clients">
              {clients.map((client) => (
                <li key={client.id}>
                  <Button
                    fill
                    alignText="start"
                    variant="minimal"
                    icon={<PersonIcon />}
                    disabled={open.isPending}
                    onClick={() => start(client)}
                    aria-label={`Open a ticket for ${client.firstName} ${client.lastName}`}
                  >
                    <span className="tr-client-name">
                      {client.firstName} {client.lastName}
                    </span>
                    <span className="tr-muted"> {[client.phone, client.homeBranchName].filter(Boolean).join(' · ')}</span>
                    {client.allergyNotes && (
                      <Tag minimal intent={Intent.DANGER} icon={<WarningSignIcon />} className="tr-client-allergy">
                        {client.allergyNotes}
                      </Tag>
                    )}
                  </Button>
                </li>
              ))}
            </ul>
          )}
        </div>
        {open.isError && (
          <Callout intent={Intent.DANGER} role="alert">
            {errorMessage(open.error)}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={open.isPending} />
            <Button text="Walk-in, no client record" icon={<PersonIcon />} loading={open.isPending} onClick={() => start(null)} />
          </>
        }
      />
    </form>
  );
}
