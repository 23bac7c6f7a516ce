import createClient from 'openapi-fetch';
import { useSyncExternalStore } from 'react';
import { redirect } from 'react-router';
import type { components, paths } from './api-schema';
import { routePaths } from './route-paths';

export type SessionView = components['schemas']['SessionView'];
export type Me = components['schemas']['MeView'];

type State = { accessToken: string; user: Me } | null;

// Session calls skip the bearer middleware: they authenticate with the httpOnly refresh cookie.
const authClient = createClient<paths>({ baseUrl: '', credentials: 'same-origin', fetch: (request) => globalThis.fetch(request) });

let state: State = null;
let refreshTimer: ReturnType<typeof setTimeout> | undefined;
let refreshing: Promise<boolean> | null = null;
let restoring: Promise<void> | null = null;
const listeners = new Set<() => void>();

function publish(next: State): void {
  state = next;
  for (const listener of listeners) listener();
}

// Refresh a minute before the access token runs out, so requests rarely meet a 401.
const refreshDelayMs = (expiresIn: number): number => Math.max(5, expiresIn - 60) * 1000;

/** The signed-in person and their access token, held in memory only; the refresh cookie survives reloads. */
export const session = {
  user: (): Me | null => state?.user ?? null,
  accessToken: (): string | null => state?.accessToken ?? null,

  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },

  start(view: SessionView): void {
    clearTimeout(refreshTimer);
    refreshTimer = setTimeout(() => void session.refresh(), refreshDelayMs(view.expiresIn));
    publish({ accessToken: view.accessToken, user: view.user });
  },

  /** Trades the refresh cookie for a new access token; concurrent callers share one request. */
  refresh(): Promise<boolean> {
    refreshing ??= (async () => {
      try {
        const { data, response } = await authClient.POST('/api/auth/refresh');
        if (data) {
          session.start(data);
          return true;
        }
        if (response.status === 401) session.end();
        return false;
      } catch {
        // Offline: keep the current token; the next request will try again.
        return false;
      } finally {
        refreshing = null;
      }
    })();
    return refreshing;
  },

  /** Resolves once the page has asked the server whether a cookie session exists. */
  async ready(): Promise<Me | null> {
    restoring ??= state ? Promise.resolve() : session.refresh().then(() => undefined);
    await restoring;
    return session.user();
  },

  async signOut(): Promise<void> {
    try {
      await authClient.POST('/api/auth/logout');
    } finally {
      session.end();
      // Another tab may sign in meanwhile, so the next page asks the server again.
      restoring = null;
    }
  },

  end(): void {
    clearTimeout(refreshTimer);
    publish(null);
  },
};

export function useSessionUser(): Me | null {
  return useSyncExternalStore(session.subscribe, session.user);
}

/** For loaders of signed-in pages: the user, or a redirect to sign-in that comes back here afterwards. */
export async function requireUser(request: Request): Promise<Me> {
  const user = await session.ready();
  if (user) return user;
  const { pathname, search } = new URL(request.url);
  const back = pathname + search;
  throw redirect(back === routePaths.overview ? routePaths.signIn : `${routePaths.signIn}?next=${encodeURIComponent(back)}`);
}
