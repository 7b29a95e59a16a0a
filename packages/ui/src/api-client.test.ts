import { studioListSchema, studioSummarySchema } from '@vatside/contracts/studios';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { ApiError, apiGet, apiSend } from './api-client.ts';

// Node's fetch needs absolute URLs; the apps call relative ones on their own origin.
const origin = 'http://vatside.example.test';
const server = setupServer();
beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => server.resetHandlers());
afterAll(() => server.close());

const rejection = (promise: Promise<unknown>) =>
  promise.then(
    () => expect.fail('expected the call to fail'),
    (error: unknown) => error,
  );

describe('apiGet', () => {
  it('turns the error shape into an ApiError with code, message, status and fields', async () => {
    server.use(
      http.get(`${origin}/api/studios`, () =>
        HttpResponse.json(
          {
            error: {
              code: 'VALIDATION_FAILED',
              message: 'Check the form.',
              fields: { slug: ['Taken'] },
            },
          },
          { status: 422 },
        ),
      ),
    );
    const error = await rejection(apiGet(`${origin}/api/studios`, studioListSchema));
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      code: 'VALIDATION_FAILED',
      message: 'Check the form.',
      status: 422,
      fields: { slug: ['Taken'] },
    });
  });

  it('reports an answer that breaks the contract as BAD_RESPONSE', async () => {
    server.use(
      http.get(`${origin}/api/studios`, () => HttpResponse.json({ studios: [{ id: 'nope' }] })),
    );
    expect(await rejection(apiGet(`${origin}/api/studios`, studioListSchema))).toMatchObject({
      code: 'BAD_RESPONSE',
      status: 200,
    });
  });

  it('reports a non-JSON failure by its status', async () => {
    server.use(
      http.get(`${origin}/api/studios`, () => new HttpResponse('Bad gateway', { status: 502 })),
    );
    expect(await rejection(apiGet(`${origin}/api/studios`, studioListSchema))).toMatchObject({
      code: 'HTTP_502',
      status: 502,
    });
  });
});

describe('apiSend', () => {
  it('sends the body as JSON and parses the answer', async () => {
    let received: unknown;
    server.use(
      http.post(`${origin}/api/studios`, async ({ request }) => {
        received = await request.json();
        return HttpResponse.json(
          {
            id: '3f1c2a4e-8b7d-4c2a-9e1f-5a6b7c8d9e01',
            slug: 'saltmarsh-vats',
            name: 'Saltmarsh Vats',
            tagline: '',
            accentHex: '#2a7f86',
          },
          { status: 201 },
        );
      }),
    );
    const created = await apiSend(
      'POST',
      `${origin}/api/studios`,
      { name: 'Saltmarsh Vats' },
      studioSummarySchema,
    );
    expect(received).toEqual({ name: 'Saltmarsh Vats' });
    expect(created.slug).toBe('saltmarsh-vats');
  });

  it('resolves a 204 without a schema', async () => {
    server.use(http.delete(`${origin}/api/x`, () => new HttpResponse(null, { status: 204 })));
    await expect(apiSend('DELETE', `${origin}/api/x`)).resolves.toBeUndefined();
  });
});
