import { HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { WarningSignIcon } from '@blueprintjs/icons';
import { generatePath, Link, useLocation } from 'react-router';
import { businessDateText } from '../../../lib/business-date';
import { routePaths } from '../../../lib/route-paths';
import type { BranchWindow, Client } from '../api/client-queries';
import { listedPatchTestStatus, patchTestStates } from './patch-test-state';

type Props = { clients: Client[]; windows: BranchWindow[] };

export function ClientTable({ clients, windows }: Props) {
  // The client page links back to this very search and page.
  const back = useLocation().search;
  return (
    <div className="tr-table-frame">
      <HTMLTable compact striped className="tr-table tr-clients-table" aria-label="Clients">
        <thead>
          <tr>
            <th scope="col">Name</th>
            <th scope="col">Phone</th>
            <th scope="col">Home branch</th>
            <th scope="col">Last patch test</th>
            <th scope="col">Allergies</th>
          </tr>
        </thead>
        <tbody>
          {clients.map((client) => {
            const status = listedPatchTestStatus(client, windows);
            const state = status ? patchTestStates[status] : null;
            return (
              <tr key={client.id}>
                <td className="tr-row-head">
                  <Link to={generatePath(routePaths.client, { clientId: client.id })} state={{ back }}>{`${client.lastName}, ${client.firstName}`}</Link>
                </td>
                <td className="tr-nowrap tr-figure-text">{client.phone ?? <span className="tr-muted">—</span>}</td>
                <td className="tr-nowrap">{client.homeBranchName}</td>
                <td className="tr-nowrap">
                  <span className="tr-clients-test-date">{client.lastPatchTestOn ? businessDateText(client.lastPatchTestOn) : <span className="tr-muted">—</span>}</span>
                  {state && (
                    <Tag minimal intent={state.intent}>
                      {state.label}
                    </Tag>
                  )}
                </td>
                <td>
                  {client.allergyNotes ? (
                    <Tag minimal intent={Intent.WARNING} icon={<WarningSignIcon />} className="tr-clients-allergy-tag" title={client.allergyNotes}>
                      {client.allergyNotes}
                    </Tag>
                  ) : (
                    <span className="tr-muted">—</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}
