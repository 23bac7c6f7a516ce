import type { QueryClient } from '@tanstack/react-query';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json } from '../../../test/fake-api';
import { openPage } from '../../../test/test-page';
import { manyMessages, outboxAccountantMe, outboxManagerMe, outboxMessages } from '../outbox-test-data';
import { OutboxRoute, outboxLoader } from './outbox.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.outbox, loader: outboxLoader(queryClient), Component: OutboxRoute }];

const rows = (table: HTMLElement) => within(table).getAllByRole('row').slice(1);
const messageText = () => within(screen.getByRole('region', { name: 'Message' })).getByLabelText('Message text').textContent;

describe('Outbox', () => {
  it('lists sent mail with its status in words, newest first, on the branch’s clock', async () => {
    fakeApi({ 'GET /api/mail/outbox': json(200, outboxMessages) });
    openPage(outboxAccountantMe, '/outbox', routes);

    const table = await screen.findByRole('table', { name: 'Sent mail' });
    expect(within(table).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['When', 'To', 'Subject', 'Status', 'Attachment']);
    const [sent, failed] = rows(table);
    // 22:54 UTC is 5:54 PM on the Elmstead branch's clock (America/Chicago, daylight time from 8 March 2026).
    expect(sent!.textContent).toMatch(/Mar 14.*5:54/);
    expect(within(sent!).getByText('jorunn@example.test')).toBeTruthy();
    expect(within(sent!).getByText('Sent')).toBeTruthy();
    expect(within(sent!).getByText('pay-statement-Jorunn-Aldersey-2026-03-01-to-2026-03-14.xlsx')).toBeTruthy();
    expect(within(failed!).getByText('Not sent')).toBeTruthy();
    expect(within(failed!).getByText('No address on file')).toBeTruthy();
    expect(screen.queryByRole('region', { name: 'Message' })).toBeNull();
  });

  it('opens a message with its body as sent, and one that was not sent with the reason', async () => {
    fakeApi({ 'GET /api/mail/outbox': json(200, outboxMessages) });
    const { user } = openPage(outboxAccountantMe, '/outbox', routes);

    const table = await screen.findByRole('table', { name: 'Sent mail' });
    const [sentButton, failedButton] = within(table).getAllByRole('button');
    await user.click(sentButton!);
    expect(messageText()).toContain('Hello Jorunn Aldersey,');
    expect(messageText()).toMatch(/Gross pay\s+1,204\.50 USD/);
    expect(messageText()).toContain('confirmed by a payroll professional');
    expect(within(screen.getByRole('region', { name: 'Message' })).queryByText('Why it was not sent')).toBeNull();

    await user.click(failedButton!);
    const detail = screen.getByRole('region', { name: 'Message' });
    expect(within(detail).getByText('Why it was not sent')).toBeTruthy();
    expect(within(detail).getByText(/No e-mail address on file for Tamsin Orrell/)).toBeTruthy();
    expect(messageText()).toContain('Hello Tamsin Orrell,');
    expect(failedButton!.getAttribute('aria-current')).toBe('true');
  });

  it('moves between messages with the arrow keys and closes with Escape', async () => {
    fakeApi({ 'GET /api/mail/outbox': json(200, outboxMessages) });
    const { user } = openPage(outboxAccountantMe, '/outbox', routes);

    const table = await screen.findByRole('table', { name: 'Sent mail' });
    const [sentButton, failedButton] = within(table).getAllByRole('button');
    failedButton!.focus();
    await user.keyboard('{Enter}');
    expect(messageText()).toContain('Hello Tamsin Orrell,');

    fireEvent.keyDown(failedButton!, { key: 'ArrowUp' });
    await waitFor(() => expect(messageText()).toContain('Hello Jorunn Aldersey,'));
    expect(document.activeElement).toBe(sentButton);

    fireEvent.keyDown(sentButton!, { key: 'Escape' });
    await waitFor(() => expect(screen.queryByRole('region', { name: 'Message' })).toBeNull());
  });

  it('says so when nothing has been sent', async () => {
    fakeApi({ 'GET /api/mail/outbox': json(200, []) });
    openPage(outboxAccountantMe, '/outbox', routes);

    expect(await screen.findByText('Nothing sent yet')).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('pages through older mail, fifty at a time', async () => {
    const asked: string[] = [];
    fakeApi({
      'GET /api/mail/outbox': (request) => {
        const url = new URL(request.url);
        const offset = Number(url.searchParams.get('offset'));
        asked.push(`${url.searchParams.get('limit')}/${offset}`);
        return json(200, offset === 0 ? manyMessages(51) : manyMessages(3, 50));
      },
    });
    const { user } = openPage(outboxAccountantMe, '/outbox', routes);

    const table = await screen.findByRole('table', { name: 'Sent mail' });
    expect(rows(table)).toHaveLength(50);
    expect(screen.getByRole('button', { name: 'Newer' }).hasAttribute('disabled')).toBe(true);
    await user.click(screen.getByRole('button', { name: 'Older' }));

    await waitFor(() => expect(rows(screen.getByRole('table', { name: 'Sent mail' }))).toHaveLength(3));
    expect(screen.getByText('Page 2')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Older' }).hasAttribute('disabled')).toBe(true);
    expect(asked).toEqual(['51/0', '51/50']);
  });

  it('is not part of a manager’s role', async () => {
    const api = fakeApi({ 'GET /api/mail/outbox': json(200, outboxMessages) });
    openPage(outboxManagerMe, '/outbox', routes);

    expect((await screen.findByRole('alert')).textContent).toBe('The outbox is kept for the owner and the accountant.');
    expect(api.calls('GET /api/mail/outbox')).toEqual([]);
  });
});
