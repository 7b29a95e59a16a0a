import { screen, within } from '@testing-library/react';
import type { Image, PaletteEdit } from '@vatside/contracts/workbench-images';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe } from '../../testing/fixtures.ts';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import { rockpoolImage, studioApi, workbenchAsHost } from '../../testing/workbench-fixtures.ts';

describe('Inspiration', { timeout: 30_000 }, () => {
  it('renames a swatch and saves the palette', async () => {
    signIn(hostMe);
    let image: Image = rockpoolImage;
    workbenchAsHost();
    server.use(
      http.get(`${studioApi}/images`, () =>
        HttpResponse.json({ items: [image], page: { limit: 25, offset: 0, total: 1 } }),
      ),
      // jsdom does not fetch images; answer anyway so nothing is left unhandled.
      http.get(`${studioApi}/images/:id/web`, () => new HttpResponse(null, { status: 204 })),
    );
    let sent: PaletteEdit | undefined;
    server.use(
      http.put(`${studioApi}/images/${rockpoolImage.id}/palette`, async ({ request }) => {
        sent = (await request.json()) as PaletteEdit;
        const labels = new Map(sent.swatches.map((s) => [s.id, s.label]));
        image = {
          ...image,
          palette: image.palette.map((s) => ({ ...s, label: labels.get(s.id) ?? s.label })),
        };
        return HttpResponse.json(image);
      }),
    );
    const { user } = renderApp('/studios/kelpwhistle-dyeworks/inspiration');

    const article = await screen.findByRole(
      'article',
      { name: 'Inspiration image 1' },
      firstRender,
    );
    expect(within(article).getByText('42 % of the image')).toBeInTheDocument();
    expect(within(article).getByText('moderate greenish blue')).toBeInTheDocument();
    await user.type(within(article).getByLabelText('Name for swatch 1'), 'Kelp shadow');
    await user.click(within(article).getByRole('button', { name: 'Save palette' }));

    expect(await within(article).findByText('Palette saved.')).toBeInTheDocument();
    expect(sent).toEqual({
      swatches: [
        { id: rockpoolImage.palette[0]!.id, label: 'Kelp shadow' },
        { id: rockpoolImage.palette[1]!.id, label: 'Sand' },
      ],
    });
    expect(await within(article).findByText('Kelp shadow')).toBeInTheDocument();
  });
});
