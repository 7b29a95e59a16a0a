import { studioListSchema } from '@vatside/contracts/studios';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '../testing/server.ts';
import { ApiError, apiGet } from './api-client.ts';

const rejection = (path: string) =>
  apiGet(path, studioListSchema).then(
    () => expect.fail('expected the call to fail'),
    (error: unknown) => error,
  );

describe('apiGet', () => {
  it('turns the error shape into an ApiError with code, message, status and fields', async () => {
    server.use(
      http.get('/api/studios', () =>
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
    const error = await rejection('/api/studios');
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      code: 'VALIDATION_FAILED',
      message: 'Check the form.',
      status: 422,
      fields: { slug: ['Taken'] },
    });
  });

  it('reports an answer that breaks the contract as BAD_RESPONSE', async () => {
    server.use(http.get('/api/studios', () => HttpResponse.json({ studios: [{ id: 'nope' }] })));
    expect(await rejection('/api/studios')).toMatchObject({ code: 'BAD_RESPONSE', status: 200 });
  });

  it('reports a non-JSON failure by its status', async () => {
    server.use(http.get('/api/studios', () => new HttpResponse('Bad gateway', { status: 502 })));
    expect(await rejection('/api/studios')).toMatchObject({ code: 'HTTP_502', status: 502 });
  });
});
