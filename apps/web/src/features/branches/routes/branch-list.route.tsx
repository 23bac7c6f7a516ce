import { Button, H1, Intent, NonIdealState, useHotkeys } from '@blueprintjs/core';
import { OfficeIcon, PlusIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { data, type LoaderFunctionArgs } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { requireUser } from '../../../lib/session';
import { type Branch, branchQueries } from '../api/branch-queries';
import { BranchFormDialog } from '../components/branch-form-dialog';
import { BranchTable } from '../components/branch-table';

export function branchListLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('update', 'Branch')) {
      throw data({ message: 'Branch settings are kept by the owner of the business.' }, { status: 403 });
    }
    await queryClient.ensureQueryData(branchQueries.list());
    return null;
  };
}

type Editing = { branch?: Branch } | null;

export function BranchListRoute() {
  const { data: branches } = useSuspenseQuery(branchQueries.list());
  const [editing, setEditing] = useState<Editing>(null);
  const startNew = () => setEditing({});

  const hotkeys = useMemo(() => [{ combo: 'n', global: true, label: 'New branch', onKeyDown: () => setEditing({}) }], []);
  useHotkeys(hotkeys);

  return (
    <section className="tr-page">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Branches</H1>
          <p className="tr-muted">Each branch keeps its own time zone, pay rules and retail tax, because local law governs.</p>
        </div>
        <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text="New branch" onClick={startNew} />
      </header>
      {branches.length === 0 ? (
        <NonIdealState
          icon={<OfficeIcon />}
          title="No branches yet"
          description="Add the first salon of the business to set its time zone, pay rules and tax."
          action={<Button intent={Intent.PRIMARY} icon={<PlusIcon />} text="New branch" onClick={startNew} />}
        />
      ) : (
        <BranchTable branches={branches} onEdit={(branch) => setEditing({ branch })} />
      )}
      <BranchFormDialog isOpen={editing !== null} branch={editing?.branch} onClose={() => setEditing(null)} />
    </section>
  );
}
