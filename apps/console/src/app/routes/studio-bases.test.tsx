import { screen, within } from '@testing-library/react';
import type { Base, BaseCreate, BaseUpdate } from '@vatside/contracts/workbench-bases';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe } from '../../testing/fixtures.ts';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import { merinoBase, studioApi, workbenchAsHost } from '../../testing/workbench-fixtures.ts';

describe('Bases & pots', { timeout: 30_000 }, () => {
  it('adds a blended base and shows the fiber check the server sends back', async () => {
    signIn(hostMe);
    let bases: Base[] = [];
    workbenchAsHost();
    server.use(
      http.get(`${studioApi}/bases`, () =>
        HttpResponse.json({ items: bases, page: { limit: 25, offset: 0, total: bases.length } }),
      ),
    );
    let sent: BaseCreate | undefined;
    server.use(
      http.post(`${studioApi}/bases`, async ({ request }) => {
        sent = (await request.json()) as BaseCreate;
        const created: Base = {
          ...merinoBase,
          name: 'Driftwood DK',
          fiberContent: [
            { fiber: 'wool', pct: 60 },
            { fiber: 'cotton', pct: 40 },
          ],
          superwash: false,
          fiberCheck: {
            takesDyePct: 60,
            doesNotTakePct: 40,
            warnings: [
              {
                code: 'BLEND_PARTLY_DYES',
                severity: 'warning',
                message: 'Only 60 % of this yarn takes acid dye.',
              },
            ],
          },
        };
        bases = [created];
        return HttpResponse.json(created, { status: 201 });
      }),
    );
    const { user } = renderApp('/studios/kelpwhistle-dyeworks/bases');

    expect(await screen.findByText(/No bases yet/, {}, firstRender)).toBeInTheDocument();
    const form = screen.getByRole('form', { name: 'Add a base' });
    await user.type(within(form).getByLabelText('Base name'), 'Driftwood DK');
    await user.type(within(form).getByLabelText('Lot'), 'L-204');
    await user.clear(within(form).getByLabelText('Share of fiber 1'));
    await user.type(within(form).getByLabelText('Share of fiber 1'), '60');
    await user.click(within(form).getByRole('button', { name: 'Add a fiber' }));
    await user.selectOptions(within(form).getByLabelText('Fiber 2'), 'cotton');
    await user.clear(within(form).getByLabelText('Share of fiber 2'));
    await user.type(within(form).getByLabelText('Share of fiber 2'), '40');
    await user.click(within(form).getByLabelText('Superwash'));
    await user.selectOptions(within(form).getByLabelText(/Weight class/), '3');
    await user.clear(within(form).getByLabelText('Skein length'));
    await user.type(within(form).getByLabelText('Skein length'), '210');
    await user.click(within(form).getByRole('button', { name: 'Add base' }));

    expect(await within(form).findByRole('status')).toHaveTextContent(
      'Driftwood DK added: 60 % of it takes acid dye',
    );
    expect(sent).toEqual({
      name: 'Driftwood DK',
      lot: 'L-204',
      fiberContent: [
        { fiber: 'wool', pct: 60 },
        { fiber: 'cotton', pct: 40 },
      ],
      superwash: false,
      weightClass: 3,
      skeinWeightG: 100,
      skeinLengthM: 210,
    });
    const notes = within(form).getByRole('region', { name: 'Fiber check for Driftwood DK' });
    expect(notes).toHaveTextContent('Careful: Only 60 % of this yarn takes acid dye.');
    const table = await screen.findByRole('table', { name: 'Yarn bases' });
    expect(within(table).getByText('Driftwood DK')).toBeInTheDocument();
    expect(within(table).getByText(/Only 60 % of this yarn takes acid dye/)).toBeInTheDocument();
  });

  it('changes a base in place: the form opens with its values and saves them to the same base', async () => {
    signIn(hostMe);
    let bases: Base[] = [merinoBase];
    workbenchAsHost();
    const sent: { id: string; body: BaseUpdate }[] = [];
    server.use(
      http.get(`${studioApi}/bases`, () =>
        HttpResponse.json({ items: bases, page: { limit: 25, offset: 0, total: bases.length } }),
      ),
      http.patch(`${studioApi}/bases/:baseId`, async ({ request, params }) => {
        const body = (await request.json()) as BaseUpdate;
        sent.push({ id: String(params.baseId), body });
        bases = bases.map((b) => (b.id === params.baseId ? ({ ...b, ...body } as Base) : b));
        return HttpResponse.json(bases[0]);
      }),
    );
    const { user } = renderApp('/studios/kelpwhistle-dyeworks/bases');

    const table = await screen.findByRole('table', { name: 'Yarn bases' }, firstRender);
    await user.click(within(table).getByRole('button', { name: 'Change Harbor sock' }));
    const form = screen.getByRole('form', { name: 'Change Harbor sock' });
    expect(within(form).getByLabelText('Base name')).toHaveValue('Harbor sock');
    await user.type(within(form).getByLabelText('Lot'), 'L-311');
    await user.click(within(form).getByRole('button', { name: 'Save changes' }));

    // The form closes and the add form is back; the row shows the saved base.
    expect(await screen.findByRole('form', { name: 'Add a base' })).toBeVisible();
    expect(sent).toEqual([
      {
        id: merinoBase.id,
        body: expect.objectContaining({ name: 'Harbor sock', lot: 'L-311', skeinWeightG: 100 }),
      },
    ]);
  });
});
