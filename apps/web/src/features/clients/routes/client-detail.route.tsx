import { Button, H1, H2, NonIdealState, useHotkeys } from '@blueprintjs/core';
import { ArrowLeftIcon, EditIcon, LabTestIcon } from '@blueprintjs/icons';
import { subject } from '@casl/ability';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { data, type LoaderFunctionArgs, Link, useLocation, useParams, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { routePaths } from '../../../lib/route-paths';
import { requireUser, useSessionUser } from '../../../lib/session';
import { FORMULA_PAGE_SIZE, clientQueries } from '../api/client-queries';
import { AllergyNotes, PatchTestPanel } from '../components/client-cautions';
import { ClientFormDialog } from '../components/client-form-dialog';
import { fullName } from '../components/client-names';
import { SafetyCautions } from '../../../components/safety-cautions';
import { FormulaTable } from '../components/formula-table';
import { Pager } from '../components/pager';
import '../components/clients.css';

const formulaPageOf = (params: URLSearchParams): number => {
  const page = Number.parseInt(params.get('page') ?? '1', 10);
  return Number.isFinite(page) && page > 0 ? page : 1;
};

export function clientDetailLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Client')) throw data({ message: 'Client records are kept by the front desk and managers.' }, { status: 403 });
    const id = params.clientId ?? '';
    await Promise.all([
      queryClient.ensureQueryData(clientQueries.detail(id)),
      queryClient.ensureQueryData(clientQueries.formulas(id, formulaPageOf(new URL(request.url).searchParams))),
    ]);
    return null;
  };
}

export function ClientDetailRoute() {
  const id = useParams().clientId ?? '';
  const [params, setParams] = useSearchParams();
  const formulaPage = formulaPageOf(params);
  const { data: client } = useSuspenseQuery(clientQueries.detail(id));
  const { data: formulas } = useSuspenseQuery(clientQueries.formulas(id, formulaPage));
  const user = useSessionUser();
  const ability = useAbility();
  const [editing, setEditing] = useState(false);
  const back: unknown = useLocation().state?.back;
  const edits = ability.can('update', subject('Client', { organisationId: user?.organisationId, homeBranchId: client.homeBranchId }));

  const hotkeys = useMemo(() => (edits ? [{ combo: 'e', global: true, label: 'Edit this client', onKeyDown: () => setEditing(true) }] : []), [edits]);
  useHotkeys(hotkeys);

  return (
    <section className="tr-page tr-clients-page">
      <Link to={`${routePaths.clients}${typeof back === 'string' ? back : ''}`} className="tr-clients-back">
        <ArrowLeftIcon /> All clients
      </Link>
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">{fullName(client)}</H1>
          <p className="tr-muted">Home branch {client.homeBranchName}</p>
        </div>
        {edits && <Button icon={<EditIcon />} text="Edit client" onClick={() => setEditing(true)} />}
      </header>

      <AllergyNotes notes={client.allergyNotes} />

      <div className="tr-clients-grid">
        <PatchTestPanel client={client} />
        <section className="tr-panel" aria-labelledby="client-contact">
          <H2 id="client-contact" className="tr-panel-title">
            Contact and notes
          </H2>
          <dl className="tr-clients-facts">
            <dt>Phone</dt>
            <dd>{client.phone ? <a href={`tel:${client.phone}`}>{client.phone}</a> : <span className="tr-muted">None</span>}</dd>
            <dt>E-mail</dt>
            <dd>{client.email ? <a href={`mailto:${client.email}`}>{client.email}</a> : <span className="tr-muted">None</span>}</dd>
            <dt>Notes</dt>
            <dd className="tr-clients-notes">{client.notes || <span className="tr-muted">None</span>}</dd>
          </dl>
        </section>
      </div>

      <section aria-labelledby="client-formulas" className="tr-clients-history">
        <div className="tr-clients-panel-head">
          <H2 id="client-formulas" className="tr-clients-section-title">
            Formula history
          </H2>
          <span className="tr-muted">
            {formulas.total} {formulas.total === 1 ? 'bowl' : 'bowls'}, newest first
          </span>
        </div>
        <SafetyCautions />
        {formulas.items.length === 0 ? (
          <NonIdealState icon={<LabTestIcon />} title="No bowls yet" description="Bowls mixed for this client on their tickets appear here." />
        ) : (
          <>
            <FormulaTable formulas={formulas.items} />
            <Pager
              label="Formula pages"
              page={formulaPage}
              pageSize={FORMULA_PAGE_SIZE}
              total={formulas.total}
              onPage={(page) => setParams(page === 1 ? {} : { page: String(page) }, { state: { back }, preventScrollReset: true })}
            />
          </>
        )}
      </section>
      <ClientFormDialog isOpen={editing} client={client} onClose={() => setEditing(false)} />
    </section>
  );
}
