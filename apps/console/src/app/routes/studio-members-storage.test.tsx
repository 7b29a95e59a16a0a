import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe, kelpwhistleDetail, members, moderatorMe } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import { kelpwhistleStorage } from '../../testing/storage-fixtures.ts';

const studioApi = '/api/studios/kelpwhistle-dyeworks';
const page = '/studios/kelpwhistle-dyeworks/members';

function serveStudio(role: 'host' | 'moderator') {
  signIn(role === 'host' ? hostMe : moderatorMe);
  let storageAsks = 0;
  server.use(
    http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail(role))),
    http.get(`${studioApi}/members`, () => HttpResponse.json({ members })),
    http.get(`${studioApi}/invitations`, () => HttpResponse.json({ invitations: [] })),
    http.get(`${studioApi}/storage`, () => {
      storageAsks += 1;
      return HttpResponse.json(kelpwhistleStorage);
    }),
  );
  return { asks: () => storageAsks };
}

describe('Storage on the members page', () => {
  it('shows the host what the studio keeps and who takes the most room', async () => {
    serveStudio('host');
    renderApp(page);
    const panel = await screen.findByRole('region', { name: 'Storage' }, { timeout: 5_000 });
    // 3 × 1024² bytes is 3 MB; 1.5 × 1024² is 1.5 MB; together 4.5 MB (binary megabytes).
    expect(await within(panel).findByText('Workbench images (4 images)')).toBeVisible();
    expect(panel).toHaveTextContent('Workbench images (4 images)3 MB');
    expect(panel).toHaveTextContent('Shared skein photos (5 photos of 3 skeins)1.5 MB');
    expect(panel).toHaveTextContent('In all4.5 MB');
    expect(panel).toHaveTextContent(
      'Each member may keep 100 MB of skein photos here and share 12 skeins an hour',
    );
    const top = within(panel).getByRole('region', { name: 'Most room taken by' });
    expect(
      within(top)
        .getAllByRole('listitem')
        .map((r) => r.textContent),
    ).toEqual(['Ada Quill 2 skeins, 4 photos1 MB', 'Ito Brack 1 skein, 1 photo512 KB']);
  });

  it('is not there for a moderator, who is never sent to ask', async () => {
    const { asks } = serveStudio('moderator');
    renderApp(page);
    await screen.findByRole('table', {}, { timeout: 5_000 });
    expect(screen.queryByRole('region', { name: 'Storage' })).toBeNull();
    expect(asks()).toBe(0);
  });
});
