import { Button, H1, HTMLSelect, Intent, NonIdealState, Switch, useHotkeys } from '@blueprintjs/core';
import { PeopleIcon, PlusIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { requireUser, useSessionUser } from '../../../lib/session';
import { type StaffMember, staffQueries } from '../api/staff-queries';
import { StaffFormDialog } from '../components/staff-form-dialog';
import { staffPermissions } from '../components/staff-permissions';
import { StaffTable } from '../components/staff-table';
import '../components/people.css';

const branchOf = (params: URLSearchParams): string | null => params.get('branch') || null;

export function staffListLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Staff')) throw data({ message: 'The staff list is not part of your role.' }, { status: 403 });
    await Promise.all([
      queryClient.ensureQueryData(staffQueries.list(branchOf(new URL(request.url).searchParams))),
      queryClient.ensureQueryData(staffQueries.levels()),
    ]);
    return null;
  };
}

type Editing = { member?: StaffMember } | null;

export function StaffListRoute() {
  const [params, setParams] = useSearchParams();
  const branchId = branchOf(params);
  const { data: staff } = useSuspenseQuery(staffQueries.list(branchId));
  const { data: levels } = useSuspenseQuery(staffQueries.levels());
  const user = useSessionUser();
  const ability = useAbility();
  const [editing, setEditing] = useState<Editing>(null);
  const [showLeft, setShowLeft] = useState(false);
  const branches = user?.branches ?? [];
  const permissions = useMemo(() => (user ? staffPermissions(user, ability) : null), [user, ability]);
  const hires = permissions !== null && branches.some((b) => permissions.hiresAt(b.id));
  const shown = showLeft ? staff : staff.filter((s) => s.active);
  const leftCount = staff.length - staff.filter((s) => s.active).length;

  const hotkeys = useMemo(() => (hires ? [{ combo: 'n', global: true, label: 'New staff member', onKeyDown: () => setEditing({}) }] : []), [hires]);
  useHotkeys(hotkeys);

  return (
    <section className="tr-page">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">People</H1>
          <p className="tr-muted">The stylists and assistants of {branches.length > 1 ? 'your branches' : (branches[0]?.name ?? 'your branch')}, by home branch.</p>
        </div>
        {hires && <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text="New staff member" onClick={() => setEditing({})} />}
      </header>
      <div className="tr-people-filters">
        {branches.length > 1 && (
          <HTMLSelect aria-label="Home branch" value={branchId ?? ''} onChange={(event) => setParams(event.currentTarget.value ? { branch: event.currentTarget.value } : {})}>
            <option value="">All my branches</option>
            {branches.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
          </HTMLSelect>
        )}
        <Switch
          className="tr-people-check"
          label={`Show those who have left (${leftCount})`}
          checked={showLeft}
          disabled={leftCount === 0}
          onChange={(event) => setShowLeft(event.currentTarget.checked)}
        />
      </div>
      {shown.length === 0 ? (
        <NonIdealState
          icon={<PeopleIcon />}
          title="Nobody here yet"
          description={hires ? 'Add the stylists and assistants who work at this branch.' : undefined}
          action={hires ? <Button icon={<PlusIcon />} text="New staff member" onClick={() => setEditing({})} /> : undefined}
        />
      ) : (
        <StaffTable
          staff={shown}
          editable={(member) => permissions?.edits(member.homeBranchId) ?? false}
          onEdit={(member) => setEditing({ member })}
        />
      )}
      {permissions && (
        <StaffFormDialog
          isOpen={editing !== null}
          member={editing?.member}
          levels={levels}
          branches={branches}
          defaultBranchId={branchId}
          permissions={permissions}
          onClose={() => setEditing(null)}
        />
      )}
    </section>
  );
}
