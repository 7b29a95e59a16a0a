import { screen, within } from '@testing-library/react';
import type { Gallery, GallerySkein } from '@vatside/contracts/gallery';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { dyeAlongApi, dyeAlongPath } from '../../testing/dye-along-fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server } from '../../testing/server.ts';

const firstLoad = { timeout: 5_000 };
const teal = { id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d', name: 'Pool Teal' };
const kelp = { id: '2b3c4d5e-6f7a-4b8c-9d0e-1f2a3b4c5d6e', name: 'Kelp Shade' };

const skein = (n: number, colorway: typeof teal): GallerySkein => {
  const id = `5b1e0000-0000-4000-8000-${String(n).padStart(12, '0')}`;
  return {
    id,
    makerName: `Maker ${n}`,
    colorway,
    baseName: 'Harbor DK',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    dyesUsed: ['Brinewell Blue'],
    notes: '',
    featured: n === 1,
    closeness: null,
    photos: [
      {
        id,
        width: 1200,
        height: 800,
        thumbWidth: 300,
        thumbHeight: 200,
        webUrl: `/photos/${n}/web`,
        thumbUrl: `/photos/${n}/thumb`,
      },
    ],
    sharedAt: '2026-12-02T10:00:00.000Z',
  };
};

/** 30 skeins (every third is Kelp Shade), served in the pages the screen asks for. */
function serveGallery() {
  const all = Array.from({ length: 30 }, (_, i) => skein(i + 1, i % 3 === 2 ? kelp : teal));
  const asked: URLSearchParams[] = [];
  server.use(
    http.get(`${dyeAlongApi}/gallery`, ({ request }) => {
      const query = new URL(request.url).searchParams;
      asked.push(query);
      const colorwayId = query.get('colorwayId');
      const matching = all.filter((s) => !colorwayId || s.colorway?.id === colorwayId);
      const limit = Number(query.get('limit'));
      const offset = Number(query.get('offset'));
      const body: Gallery = {
        items: matching.slice(offset, offset + limit),
        page: { limit, offset, total: matching.length },
        colorways: [
          {
            ...teal,
            technique: 'immersion',
            swatches: [{ hex: '#2d6f86', name: 'Deep pool' }],
            photo: null,
          },
          { ...kelp, technique: 'speckle', swatches: [], photo: null },
        ],
      };
      return HttpResponse.json(body);
    }),
    http.get(`${dyeAlongApi}/gallery/:skeinId`, ({ params }) =>
      HttpResponse.json(all.find((s) => s.id === params.skeinId)),
    ),
  );
  return asked;
}

describe('Gallery', { timeout: 30_000 }, () => {
  it('shows a page of sized, lazy thumbnails, then more on request, and filters by colorway', async () => {
    const asked = serveGallery();
    const { user, router } = renderApp(`${dyeAlongPath}/gallery`);
    const grid = await screen.findByRole('list', { name: 'Shared skeins' }, firstLoad);
    expect(within(grid).getAllByRole('link')).toHaveLength(24);
    const thumb = grid.querySelector('img')!;
    expect(thumb).toHaveAttribute('loading', 'lazy');
    expect(thumb).toHaveAttribute('width', '300');
    expect(thumb).toHaveAttribute('height', '200');
    expect(screen.getByText('Showing 24 of 30 skeins.')).toBeInTheDocument();
    const strip = screen.getByRole('region', { name: 'From the studio' });
    expect(within(strip).getByText('Deep pool')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Show more skeins' }));
    await screen.findByText('Showing 30 of 30 skeins.');
    expect(within(grid).getAllByRole('link')).toHaveLength(30);
    expect(asked.map((q) => q.get('offset'))).toEqual(['0', '24']);
    expect(screen.queryByRole('button', { name: 'Show more skeins' })).not.toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Kelp Shade', pressed: false }));
    await screen.findByText('Showing 10 of 10 skeins of Kelp Shade.');
    expect(router.state.location.search).toBe(`?colorway=${kelp.id}`);
    expect(asked.at(-1)?.get('colorwayId')).toBe(kelp.id);

    expect(within(grid).getByRole('link', { name: 'Kelp Shade by Maker 3' })).toHaveAttribute(
      'href',
      `${dyeAlongPath}/gallery/5b1e0000-0000-4000-8000-000000000003`,
    );
  });

  it('opens one skein straight from its own address, as when the link is passed on', async () => {
    serveGallery();
    renderApp(`${dyeAlongPath}/gallery/5b1e0000-0000-4000-8000-000000000003`);
    await screen.findByRole('heading', { level: 1, name: 'Kelp Shade' }, firstLoad);
    expect(screen.getByText('Maker 3')).toBeInTheDocument();
    expect(screen.getByText('100 % wool')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /^Photo 1 of 1/ })).toHaveAttribute('width', '1200');
  });
});
