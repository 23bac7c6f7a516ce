import { vi } from 'vitest';

type Reply = Response | ((request: Request) => Response | Promise<Response>);

export const json = (status: number, body: unknown): Response =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

export const problem = (status: number, code: string, message: string, details: { field: string; message: string }[] = []): Response =>
  json(status, { statusCode: status, code, message, details });

export type SeenRequest = { method: string; path: string; authorization: string | null; body: string };

/**
 * Replaces `fetch` with a scripted server: each "METHOD /path" answers from its list in turn (the last
 * answer repeats); anything unscripted is a 404. Every request is recorded as the server saw it.
 */
export function fakeApi(script: Record<string, Reply | Reply[]>) {
  const seen: SeenRequest[] = [];
  const served = new Map<string, number>();

  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const request = input instanceof Request ? input : new Request(input, init);
    const path = new URL(request.url).pathname;
    const key = `${request.method} ${path}`;
    seen.push({ method: request.method, path, authorization: request.headers.get('Authorization'), body: await request.text() });
    const replies = script[key];
    if (!replies) return json(404, { statusCode: 404, code: 'not_found', message: `Not scripted: ${key}`, details: [] });
    const list = Array.isArray(replies) ? replies : [replies];
    const index = served.get(key) ?? 0;
    served.set(key, index + 1);
    const reply = list[Math.min(index, list.length - 1)] as Reply;
    // A Response body can be read once; hand out a fresh copy each time.
    return typeof reply === 'function' ? reply(request) : reply.clone();
  });

  vi.stubGlobal('fetch', fetch);
  return { seen, calls: (key: string) => seen.filter((r) => `${r.method} ${r.path}` === key) };
}
