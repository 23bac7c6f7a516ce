import { Spinner, Tag } from '@blueprintjs/core';
import { Suspense } from 'react';
import { Navigate, Outlet, type LoaderFunctionArgs, useNavigation } from 'react-router';
import { Wordmark } from '../components/wordmark';
import { SignOutButton } from '../features/auth/components/sign-out-button';
import { AbilityContext, abilityFor } from '../lib/ability';
import { roleLabels } from '../lib/role-labels';
import { routePaths } from '../lib/route-paths';
import { requireUser, useSessionUser } from '../lib/session';
import { ThemeToggle } from '../theme/theme-toggle';
import { MainNav } from './main-nav';

export async function shellLoader({ request }: LoaderFunctionArgs) {
  await requireUser(request);
  return null;
}

export function AppShell() {
  const user = useSessionUser();
  const navigation = useNavigation();
  // Signed out here or the session could not be renewed: leave before any page asks the API again.
  if (!user) return <Navigate to={routePaths.signIn} replace />;

  return (
    <AbilityContext value={abilityFor(user)}>
      <div className="tr-shell">
        <aside className="tr-rail">
          <div className="tr-rail-brand">
            <Wordmark />
          </div>
          <MainNav />
        </aside>
        <div className="tr-main">
          <header className="tr-topbar">
            <div className="tr-topbar-org">{user.organisationName}</div>
            <div className="tr-topbar-person">
              <span className="tr-person-name">{user.displayName}</span>
              <Tag minimal round>
                {roleLabels[user.role]}
              </Tag>
              <ThemeToggle />
              <SignOutButton />
            </div>
          </header>
          <div className="tr-progress" aria-hidden="true">
            {navigation.state === 'loading' && <div className="tr-progress-line" />}
          </div>
          <main className="tr-content">
            <Suspense fallback={<Spinner aria-label="Loading" />}>
              <Outlet />
            </Suspense>
          </main>
        </div>
      </div>
    </AbilityContext>
  );
}
