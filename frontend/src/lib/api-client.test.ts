import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../testing/fake-network';
import { ApiClient, ApiRequestError } from './api-client';

const csrf = (token: string) => ({ status: 200, body: { csrfToken: token } });
const csrfRefused = {
  status: 403,
  body: {
    statusCode: 403,
    error: 'Forbidden',
    message: 'The security token expired. Try again.',
    code: 'csrf_invalid',
    requestId: 'r-1',
  },
};

describe('ApiClient', () => {
  it('sends the CSRF token from /auth/csrf on writes, with the session cookie', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf('tok-A'),
      'POST /api/crews': { status: 201, body: { id: 'c1' } },
    });
    const client = new ApiClient(net.fetch);

    await expect(client.post('/crews', { name: 'Dawn Patrol' })).resolves.toEqual({ id: 'c1' });

    const [write] = net.to('POST /api/crews');
    expect(write.headers['x-csrf-token']).toBe('tok-A');
    expect(write.credentials).toBe('include');
    expect(write.body).toEqual({ name: 'Dawn Patrol' });
  });

  it('fetches no token for reads and sends no CSRF header on them', async () => {
    const net = fakeNetwork({ 'GET /api/crews': { status: 200, body: [] } });
    const client = new ApiClient(net.fetch);
    await client.get('/crews');
    expect(net.to('GET /api/auth/csrf')).toHaveLength(0);
    expect(net.seen[0].headers['x-csrf-token']).toBeUndefined();
    expect(net.seen[0].credentials).toBe('include');
  });

  it('reuses one token for several writes', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf('tok-A'),
      'DELETE /api/crews/c1/invites/i1': { status: 204 },
    });
    const client = new ApiClient(net.fetch);
    await client.delete('/crews/c1/invites/i1');
    await client.delete('/crews/c1/invites/i1');
    expect(net.to('GET /api/auth/csrf')).toHaveLength(1);
  });

  it('on 403 csrf_invalid fetches a fresh token and retries the request once', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': [csrf('stale'), csrf('fresh')],
      'PATCH /api/auth/me': [csrfRefused, { status: 200, body: { user: { displayName: 'Rae' } } }],
    });
    const client = new ApiClient(net.fetch);

    await expect(client.patch('/auth/me', { displayName: 'Rae' })).resolves.toEqual({ user: { displayName: 'Rae' } });

    const writes = net.to('PATCH /api/auth/me');
    expect(writes.map((w) => w.headers['x-csrf-token'])).toEqual(['stale', 'fresh']);
    expect(writes[1].body).toEqual({ displayName: 'Rae' });
  });

  it('retries only once: a second csrf_invalid reaches the caller', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': [csrf('one'), csrf('two')],
      'POST /api/crews': [csrfRefused, csrfRefused],
    });
    const client = new ApiClient(net.fetch);

    const error = await client.post('/crews', { name: 'x' }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiRequestError);
    expect((error as ApiRequestError).code).toBe('csrf_invalid');
    expect(net.to('POST /api/crews')).toHaveLength(2);
  });

  it('does not retry a 403 that is about permissions', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf('tok'),
      'POST /api/crews/c1/invites': {
        status: 403,
        body: { statusCode: 403, error: 'Forbidden', message: 'Only owners can invite.', requestId: 'r-2' },
      },
    });
    const client = new ApiClient(net.fetch);
    await expect(client.post('/crews/c1/invites', {})).rejects.toMatchObject({
      statusCode: 403,
      message: 'Only owners can invite.',
    });
    expect(net.to('POST /api/crews/c1/invites')).toHaveLength(1);
    expect(net.to('GET /api/auth/csrf')).toHaveLength(1);
  });

  it('parses the error shape, field errors included', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf('tok'),
      'POST /api/auth/sign-up': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields need attention.',
          fieldErrors: {
            email: ['Enter a valid e-mail address.'],
            password: ['Use at least 10 characters.', 'Too common.'],
          },
          requestId: 'req-77',
        },
      },
    });
    const client = new ApiClient(net.fetch);
    const error = (await client.post('/auth/sign-up', {}).catch((e: unknown) => e)) as ApiRequestError;

    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Some fields need attention.',
      requestId: 'req-77',
    });
    expect(error.messagesFor('email')).toEqual(['Enter a valid e-mail address.']);
    expect(error.messagesFor('password')).toEqual(['Use at least 10 characters.', 'Too common.']);
    expect(error.messagesFor('displayName')).toEqual([]);
  });

  it('turns a non-JSON error page into a readable error with the status', async () => {
    const net = fakeNetwork({ 'GET /api/crews': { status: 502, rawBody: '<html><body>Bad gateway</body></html>' } });
    const client = new ApiClient(net.fetch);
    const error = (await client.get('/crews').catch((e: unknown) => e)) as ApiRequestError;
    expect(error.statusCode).toBe(502);
    expect(error.message).toContain('502');
    expect(error.message).not.toContain('<html>');
    expect(error.fieldErrors).toBeUndefined();
  });

  it('ignores malformed fieldErrors rather than trusting them', async () => {
    const net = fakeNetwork({
      'GET /api/crews': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'No.', fieldErrors: { name: 'not a list' } },
      },
    });
    const client = new ApiClient(net.fetch);
    const error = (await client.get('/crews').catch((e: unknown) => e)) as ApiRequestError;
    expect(error.message).toBe('No.');
    expect(error.fieldErrors).toBeUndefined();
  });

  it('reports an unreachable server as status 0 with a plain sentence', async () => {
    const client = new ApiClient(async () => {
      throw new TypeError('Failed to fetch');
    });
    const error = (await client.get('/auth/me').catch((e: unknown) => e)) as ApiRequestError;
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.statusCode).toBe(0);
    expect(error.message).toMatch(/could not reach/i);
  });

  it('renews the token after a request that changes the session', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': [csrf('before-sign-in'), csrf('after-sign-in')],
      'POST /api/auth/sign-in': { status: 200, body: { user: {}, crews: [] } },
      'POST /api/crews': { status: 201, body: { id: 'c9' } },
    });
    const client = new ApiClient(net.fetch);
    await client.post('/auth/sign-in', { email: 'a@b.test', password: 'x' }, { renewsSession: true });
    await client.post('/crews', { name: 'n' });

    expect(net.to('POST /api/auth/sign-in')[0].headers['x-csrf-token']).toBe('before-sign-in');
    expect(net.to('POST /api/crews')[0].headers['x-csrf-token']).toBe('after-sign-in');
  });

  it('answers 204 with undefined', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf('t'), 'POST /api/auth/sign-out': { status: 204 } });
    await expect(new ApiClient(net.fetch).post('/auth/sign-out')).resolves.toBeUndefined();
  });
});
