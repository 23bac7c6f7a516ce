import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { session } from '../../../lib/session';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { ownerMe, sessionOf } from '../../../test/sessions';
import { SignInForm } from './sign-in-form';

function renderForm() {
  const onSignedIn = vi.fn();
  render(
    <QueryClientProvider client={createQueryClient()}>
      <SignInForm onSignedIn={onSignedIn} />
    </QueryClientProvider>,
  );
  return { onSignedIn };
}

async function signInAs(email: string, password: string) {
  const user = userEvent.setup();
  await user.type(screen.getByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  afterEach(() => session.end());

  it("shows the server's message when the sign-in is refused", async () => {
    fakeApi({ 'POST /api/auth/login': problem(401, 'auth.not_signed_in', 'The e-mail or password is not right.') });
    const { onSignedIn } = renderForm();

    await signInAs('owner@example.test', 'not-the-password');

    expect((await screen.findByRole('alert')).textContent).toContain('The e-mail or password is not right.');
    expect(onSignedIn).not.toHaveBeenCalled();
    expect(session.user()).toBeNull();
  });

  it('says to wait when there were too many attempts', async () => {
    fakeApi({ 'POST /api/auth/login': problem(429, 'request.too_many', 'Too many attempts; wait a minute and try again.') });
    renderForm();

    await signInAs('owner@example.test', 'guess');

    expect((await screen.findByRole('alert')).textContent).toContain('Too many attempts; wait a minute and try again.');
  });

  it('starts the session and moves on when the credentials are right', async () => {
    const api = fakeApi({ 'POST /api/auth/login': json(200, sessionOf(ownerMe)) });
    const { onSignedIn } = renderForm();

    await signInAs(' owner@example.test ', 'right-password');

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledOnce());
    expect(session.user()?.displayName).toBe('Ines Marwood');
    expect(JSON.parse(api.calls('POST /api/auth/login')[0]?.body ?? '')).toEqual({ email: 'owner@example.test', password: 'right-password' });
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
