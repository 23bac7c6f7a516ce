import { Button, H1, HTMLSelect, InputGroup, Intent, NonIdealState, useHotkeys } from '@blueprintjs/core';
import { PersonIcon, PlusIcon, SearchIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { type FormEvent, useMemo, useRef, useState } from 'react';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { requireUser, useSessionUser } from '../../../lib/session';
import { CLIENT_PAGE_SIZE, type ClientSearch, clientQueries } from '../api/client-queries';
import { ClientFormDialog } from '../components/client-form-dialog';
import { ClientTable } from '../components/client-table';
import { Pager } from '../components/pager';
import '../components/clients.css';

/** The list's address: `?search=&branch=&page=`, so a search survives a reload and the back button. */
function clientSearchOf(params: URLSearchParams): ClientSearch {
  const page = Number.parseInt(params.get('page') ?? '1', 10);
  return { search: (params.get('search') ?? '').trim(), branchId: params.get('branch') || null, page: Number.isFinite(page) && page > 0 ? page : 1 };
}

export function clientListLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Client')) {
      throw data({ message: 'Client records are kept by the front desk and managers; stylists see the clients they serve.' }, { status: 403 });
    }
    await Promise.all([
      queryClient.ensureQueryData(clientQueries.list(clientSearchOf(new URL(request.url).searchParams))),
      queryClient.ensureQueryData(clientQueries.branchWindows()),
    ]);
    return null;
  };
}

const SEARCH_PAUSE_MS = 300;

export function ClientListRoute() {
  const [params, setParams] = useSearchParams();
  const asked = clientSearchOf(params);
  const { data: page } = useSuspenseQuery(clientQueries.list(asked));
  const { data: windows } = useSuspenseQuery(clientQueries.branchWindows());
  const branches = useSessionUser()?.branches ?? [];
  const ability = useAbility();
  const adds = ability.can('create', 'Client');
  const [adding, setAdding] = useState(false);
  const [typed, setTyped] = useState(asked.search);
  const pause = useRef<ReturnType<typeof setTimeout>>(undefined);
  const searchBox = useRef<HTMLInputElement>(null);

  const go = (changes: Partial<Record<'search' | 'branch' | 'page', string>>) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        for (const [name, value] of Object.entries(changes)) {
          if (value && !(name === 'page' && value === '1')) next.set(name, value);
          else next.delete(name);
        }
        return next;
      },
      { replace: 'search' in changes },
    );

  const searchFor = (text: string) => {
    clearTimeout(pause.current);
    if (text.trim() !== asked.search) go({ search: text.trim(), page: '1' });
  };

  const onType = (text: string) => {
    setTyped(text);
    clearTimeout(pause.current);
    pause.current = setTimeout(() => searchFor(text), SEARCH_PAUSE_MS);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    searchFor(typed);
  };

  const hotkeys = useMemo(
    () => [
      { combo: '/', global: true, label: 'Find a client', preventDefault: true, onKeyDown: () => searchBox.current?.focus() },
      ...(adds ? [{ combo: 'n', global: true, label: 'New client', onKeyDown: () => setAdding(true) }] : []),
    ],
    [adds],
  );
  useHotkeys(hotkeys);

  const branchName = branches.find((b) => b.id === asked.branchId)?.name;
  const summary = asked.search
    ? `${page.total} ${page.total === 1 ? 'client matches' : 'clients match'} “${asked.search}”${branchName ? ` at ${branchName}` : ''}.`
    : `${page.total} ${page.total === 1 ? 'client' : 'clients'}${branchName ? ` of ${branchName}` : ''}${adds ? '' : ' you have served'}.`;

  return (
    <section className="tr-page">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Clients</H1>
          <p className="tr-muted" aria-live="polite">
            {summary}
          </p>
        </div>
        {adds && <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text="New client" onClick={() => setAdding(true)} />}
      </header>
      <form className="tr-clients-filters" role="search" onSubmit={submit}>
        <InputGroup
          inputRef={searchBox}
          type="search"
          aria-label="Find a client by name, phone or e-mail"
          placeholder="Name, phone or e-mail (press / to jump here)"
          leftIcon={<SearchIcon />}
          className="tr-clients-search"
          value={typed}
          onValueChange={onType}
        />
        {branches.length > 1 && (
          <HTMLSelect aria-label="Home branch" value={asked.branchId ?? ''} onChange={(event) => go({ branch: event.currentTarget.value, page: '1' })}>
            <option value="">All my branches</option>
            {branches.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
          </HTMLSelect>
        )}
      </form>
      {page.items.length === 0 && asked.page > 1 ? (
        <NonIdealState
          icon={<PersonIcon />}
          title="Nothing on this page"
          description="The list is shorter than this page number."
          action={<Button text="Back to the first page" onClick={() => go({ page: '1' })} />}
        />
      ) : page.items.length === 0 ? (
        <NonIdealState
          icon={<PersonIcon />}
          title={asked.search ? 'No client matches' : 'No clients yet'}
          description={
            asked.search
              ? 'Try part of the name, or the phone number’s digits.'
              : adds
                ? 'Add the first client to keep their contact, allergies and formulas in one place.'
                : 'Clients you have served appear here.'
          }
          action={adds ? <Button icon={<PlusIcon />} text="New client" onClick={() => setAdding(true)} /> : undefined}
        />
      ) : (
        <>
          <ClientTable clients={page.items} windows={windows} />
          <Pager label="Client pages" page={asked.page} pageSize={CLIENT_PAGE_SIZE} total={page.total} onPage={(p) => go({ page: String(p) })} />
        </>
      )}
      <ClientFormDialog isOpen={adding} defaultBranchId={asked.branchId} onClose={() => setAdding(false)} />
    </section>
  );
}
