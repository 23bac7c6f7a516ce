import createClient, { type Middleware } from 'openapi-fetch';
import type { paths } from './api-schema';
import { ApiError } from './api-error';
import { session } from './session';

// A 401 from these means wrong credentials or an ended session, never an expired access token.
const sessionPaths = new Set(['/api/auth/login', '/api/auth/refresh', '/api/auth/logout']);

// Bodies are streams: keep an unsent copy of each request so it can be replayed once after a refresh.
const replays = new Map<string, Request>();

const bearer: Middleware = {
  onRequest({ request, schemaPath, id }) {
    const token = session.accessToken();
    if (token) request.headers.set('Authorization', `Bearer ${token}`);
    if (!sessionPaths.has(schemaPath)) replays.set(id, request.clone());
    return request;
  },
  async onResponse({ response, id, options }) {
    const replay = replays.get(id);
    replays.delete(id);
    if (response.status !== 401 || !replay) return undefined;
    if (!(await session.refresh())) return undefined;
    replay.headers.set('Authorization', `Bearer ${session.accessToken()}`);
    return options.fetch(replay);
  },
  onError({ id }) {
    replays.delete(id);
  },
};

/** The one typed client for the API; paths and bodies come from the generated OpenAPI types. */
export const http = createClient<paths>({ baseUrl: '', credentials: 'same-origin', fetch: (request) => globalThis.fetch(request) });
http.use(bearer);

type Outcome<T> = { data?: T; error?: unknown; response: Response };

/** Awaits an API call and returns its body, or throws an ApiError with the server's message. */
export async function expectData<T>(call: Promise<Outcome<T>>): Promise<T> {
  let outcome: Outcome<T>;
  try {
    outcome = await call;
  } catch {
    throw ApiError.from(0, undefined);
  }
  if (!outcome.response.ok) throw ApiError.from(outcome.response.status, outcome.error);
  return outcome.data as T;
}
