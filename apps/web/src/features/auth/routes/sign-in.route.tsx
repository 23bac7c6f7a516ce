import { H1 } from '@blueprintjs/core';
import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams } from 'react-router';
import { Wordmark } from '../../../components/wordmark';
import { routePaths } from '../../../lib/route-paths';
import { session } from '../../../lib/session';
import { ThemeToggle } from '../../../theme/theme-toggle';
import { SignInForm } from '../components/sign-in-form';
import './sign-in.css';

export function signInLoader(queryClient: QueryClient) {
  return async () => {
    if (await session.ready()) throw redirect(routePaths.overview);
    queryClient.clear();
    return null;
  };
}

// Only paths inside this app; "//host" would leave it.
const safeNext = (next: string | null): string => (next?.startsWith('/') && !next.startsWith('//') ? next : routePaths.overview);

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));

  return (
    <main className="tr-sign-in">
      <div className="tr-sign-in-corner">
        <ThemeToggle />
      </div>
      <div className="tr-sign-in-panel">
        <Wordmark />
        <H1 className="tr-sign-in-title">Sign in</H1>
        <p className="tr-muted">The back office of your salon group. Use the e-mail address your salon gave you.</p>
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      </div>
    </main>
  );
}
