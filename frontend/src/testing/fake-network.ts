import { vi } from 'vitest';

/** One request as the fake network saw it. */
export interface SeenRequest {
  method: string;
  path: string;
  headers: Record<string, string>;
  credentials?: RequestCredentials;
  body: unknown;
}

export type Reply = { status: number; body?: unknown; rawBody?: string };
export type Handler = (request: SeenRequest) => Reply | Promise<Reply>;

/**
 * A stand-in for the network (the browser's fetch), the boundary of the front end: each test states the
 * server's answers per "METHOD /path" and reads back exactly what was sent.
 */
export function fakeNetwork(routes: Record<string, Handler | Reply | Reply[]>) {
  const seen: SeenRequest[] = [];
  const queues = new Map<string, Reply[]>();
  for (const [key, value] of Object.entries(routes)) if (Array.isArray(value)) queues.set(key, [...value]);

  const fetchImpl = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(String(input), 'http://shoalbook.test');
    const headers = Object.fromEntries(
      Object.entries((init.headers ?? {}) as Record<string, string>).map(([k, v]) => [k.toLowerCase(), v]),
    );
    const request: SeenRequest = {
      method: init.method ?? 'GET',
      path: url.pathname,
      headers,
      credentials: init.credentials,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    seen.push(request);
    const key = `${request.method} ${request.path}`;
    const route = routes[key];
    let reply: Reply | undefined;
    if (Array.isArray(route)) reply = queues.get(key)?.shift();
    else if (typeof route === 'function') reply = await route(request);
    else reply = route;
    if (!reply) throw new Error(`fake network: no answer left for ${key}`);
    const text = reply.rawBody ?? (reply.body === undefined ? '' : JSON.stringify(reply.body));
    return new Response(reply.status === 204 ? null : text, {
      status: reply.status,
      headers: { 'Content-Type': reply.rawBody ? 'text/html' : 'application/json' },
    });
  });

  return {
    fetch: fetchImpl as unknown as typeof fetch,
    seen,
    /** Requests to one "METHOD /path". */
    to: (key: string) => seen.filter((r) => `${r.method} ${r.path}` === key),
    /** Replace the browser's fetch, so the app's own API client talks to this fake. */
    install() {
      vi.stubGlobal('fetch', fetchImpl);
      return this;
    },
  };
}
