import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { branchRows } from '../../../test/sessions';
import type { Branch } from '../api/branch-queries';
import { BranchFormDialog } from './branch-form-dialog';

function renderDialog(branch?: Branch) {
  const onClose = vi.fn();
  render(
    <QueryClientProvider client={createQueryClient()}>
      <BlueprintProvider>
        <BranchFormDialog isOpen branch={branch} onClose={onClose} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return { onClose, user: userEvent.setup() };
}

/** What a screen reader announces for a field: whether it is invalid, and the text that describes it. */
function fieldState(label: string) {
  const input = screen.getByLabelText(label);
  const description = (input.getAttribute('aria-describedby') ?? '')
    .split(' ')
    .map((id) => document.getElementById(id)?.textContent ?? '')
    .join(' ');
  return { invalid: input.getAttribute('aria-invalid') === 'true', description };
}

describe('BranchFormDialog', () => {
  it("puts each of the server's field problems under the field it names", async () => {
    const api = fakeApi({
      'POST /api/branches': problem(400, 'request.invalid', 'Check these fields: timeZone, minimumWage.', [
        { field: 'timeZone', message: 'timeZone must be a valid IANA time-zone' },
        { field: 'minimumWage', message: 'minimumWage must be a decimal number written as text from 0 to 1000' },
      ]),
    });
    const { user, onClose } = renderDialog();

    await user.type(screen.getByLabelText('Name'), 'Elmstead');
    await user.clear(screen.getByLabelText('Minimum wage'));
    await user.type(screen.getByLabelText('Minimum wage'), '7.255');
    await user.click(screen.getByRole('button', { name: 'Create branch' }));

    await waitFor(() => expect(fieldState('Minimum wage').invalid).toBe(true));
    expect(fieldState('Minimum wage').description).toBe('minimumWage must be a decimal number written as text from 0 to 1000');
    expect(fieldState('Time zone')).toEqual({ invalid: true, description: 'timeZone must be a valid IANA time-zone' });
    expect(document.activeElement).toBe(screen.getByLabelText('Time zone'));
    for (const untouched of ['Name', 'Currency', 'Overtime after (hours)', 'Overtime multiplier', 'Retail tax rate']) {
      expect(fieldState(untouched).invalid, untouched).toBe(false);
    }
    expect(onClose).not.toHaveBeenCalled();

    await user.clear(screen.getByLabelText('Minimum wage'));
    await user.type(screen.getByLabelText('Minimum wage'), '7.25');
    expect(fieldState('Minimum wage').invalid).toBe(false);
    expect(fieldState('Time zone').invalid).toBe(true);
    expect(document.activeElement).toBe(screen.getByLabelText('Minimum wage'));
    expect(JSON.parse(api.calls('POST /api/branches')[0]?.body ?? '')).toMatchObject({ name: 'Elmstead', minimumWage: '7.255', currency: 'USD' });
  });

  it('clears a field’s problem once it is changed', async () => {
    fakeApi({
      'POST /api/branches': problem(409, 'branch.name_taken', 'A branch called "Elmstead" already exists in this organisation.', [
        { field: 'name', message: 'A branch called "Elmstead" already exists in this organisation.' },
      ]),
    });
    const { user } = renderDialog();

    await user.type(screen.getByLabelText('Name'), 'Elmstead');
    await user.selectOptions(screen.getByLabelText('Time zone'), 'America/Chicago');
    await user.click(screen.getByRole('button', { name: 'Create branch' }));
    await waitFor(() => expect(fieldState('Name').invalid).toBe(true));
    expect(fieldState('Name').description).toContain('already exists');

    await user.type(screen.getByLabelText('Name'), ' North');

    expect(fieldState('Name').invalid).toBe(false);
  });

  it('edits a branch by sending only what changed', async () => {
    const [elmstead] = branchRows as [Branch];
    const api = fakeApi({ 'PATCH /api/branches/b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01': json(200, { ...elmstead, overtimeMultiplier: '2' }) });
    const { user, onClose } = renderDialog(elmstead);

    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Elmstead');
    expect((screen.getByLabelText('Apply the commission overtime exemption') as HTMLInputElement).checked).toBe(true);
    await user.clear(screen.getByLabelText('Overtime multiplier'));
    await user.type(screen.getByLabelText('Overtime multiplier'), '2{Enter}');

    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(JSON.parse(api.calls('PATCH /api/branches/b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01')[0]?.body ?? '')).toEqual({ overtimeMultiplier: '2' });
  });

  it('shows the franchise rates as percentages and sends them as the fractions the API keeps', async () => {
    const [elmstead] = branchRows as [Branch];
    const api = fakeApi({ 'PATCH /api/branches/b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01': json(200, { ...elmstead, royaltyRate: '0.065' }) });
    const { user, onClose } = renderDialog(elmstead);

    // Stored 0.06 and 0.015: 6 % and 1.5 %.
    expect((screen.getByLabelText('Royalty (% of gross sales)') as HTMLInputElement).value).toBe('6');
    expect((screen.getByLabelText('Marketing fund (% of gross sales)') as HTMLInputElement).value).toBe('1.5');
    await user.clear(screen.getByLabelText('Royalty (% of gross sales)'));
    await user.type(screen.getByLabelText('Royalty (% of gross sales)'), '6.5{Enter}');

    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(JSON.parse(api.calls('PATCH /api/branches/b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01')[0]?.body ?? '')).toEqual({ royaltyRate: '0.065' });
  });

  it('puts a refused rate under its percentage field', async () => {
    fakeApi({
      'POST /api/branches': problem(400, 'request.invalid', 'Check these fields: marketingFundRate.', [
        { field: 'marketingFundRate', message: 'marketingFundRate must be a fraction from 0 up to (not including) 1' },
      ]),
    });
    const { user } = renderDialog();
    await user.type(screen.getByLabelText('Name'), 'Elmstead');
    await user.selectOptions(screen.getByLabelText('Time zone'), 'America/Chicago');
    await user.clear(screen.getByLabelText('Marketing fund (% of gross sales)'));
    await user.type(screen.getByLabelText('Marketing fund (% of gross sales)'), '120');
    await user.click(screen.getByRole('button', { name: 'Create branch' }));

    await waitFor(() => expect(fieldState('Marketing fund (% of gross sales)').invalid).toBe(true));
    expect(document.activeElement).toBe(screen.getByLabelText('Marketing fund (% of gross sales)'));
  });
});
