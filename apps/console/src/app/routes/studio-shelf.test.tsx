import { screen, within } from '@testing-library/react';
import type {
  Dye,
  DyeUpdate,
  StockSolution,
  StockSolutionUpdate,
} from '@vatside/contracts/workbench-shelf';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe } from '../../testing/fixtures.ts';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import {
  studioApi,
  tealDye,
  tealStock,
  workbenchAsHost,
} from '../../testing/workbench-fixtures.ts';

describe('The dye shelf', { timeout: 30_000 }, () => {
  it('changes a dye in place: its jars and recipes keep pointing at the same dye', async () => {
    signIn(hostMe);
    let dyes: Dye[] = [tealDye];
    workbenchAsHost();
    const sent: { id: string; body: DyeUpdate }[] = [];
    server.use(
      http.get(`${studioApi}/dyes`, () =>
        HttpResponse.json({ items: dyes, page: { limit: 25, offset: 0, total: dyes.length } }),
      ),
      http.patch(`${studioApi}/dyes/:dyeId`, async ({ request, params }) => {
        const body = (await request.json()) as DyeUpdate;
        sent.push({ id: String(params.dyeId), body });
        dyes = dyes.map((d) => (d.id === params.dyeId ? ({ ...d, ...body } as Dye) : d));
        return HttpResponse.json(dyes[0]);
      }),
    );
    const { user } = renderApp('/studios/kelpwhistle-dyeworks/shelf');

    const table = await screen.findByRole('table', { name: /dyes/i }, firstRender);
    await user.click(within(table).getByRole('button', { name: 'Change Rockpool teal' }));
    const form = screen.getByRole('form', { name: 'Change Rockpool teal' });
    const name = within(form).getByLabelText('Dye name');
    expect(name).toHaveValue('Rockpool teal');
    await user.clear(name);
    await user.type(name, 'Rockpool teal, 2026 lot');
    await user.click(within(form).getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByRole('form', { name: 'Add a dye' })).toBeVisible();
    expect(sent).toEqual([
      {
        id: tealDye.id,
        body: expect.objectContaining({ name: 'Rockpool teal, 2026 lot', kind: 'acidDyePowder' }),
      },
    ]);
    expect(await within(table).findByText('Rockpool teal, 2026 lot')).toBeVisible();
  });

  it('corrects a jar as it was recorded, leaving what is left to adjustments', async () => {
    signIn(hostMe);
    let stocks: StockSolution[] = [tealStock];
    workbenchAsHost({ dyes: [tealDye] });
    const sent: StockSolutionUpdate[] = [];
    server.use(
      http.get(`${studioApi}/stock-solutions`, () =>
        HttpResponse.json({ items: stocks, page: { limit: 25, offset: 0, total: stocks.length } }),
      ),
      http.patch(`${studioApi}/stock-solutions/:stockId`, async ({ request }) => {
        const body = (await request.json()) as StockSolutionUpdate;
        sent.push(body);
        // 2 % w/v is 2 g per 100 mL: 500 mL of it holds 10 g of dye (common practice).
        stocks = [{ ...tealStock, ...body, dyeLeftG: 10 }];
        return HttpResponse.json(stocks[0]);
      }),
    );
    const { user } = renderApp('/studios/kelpwhistle-dyeworks/shelf');

    const table = await screen.findByRole('table', { name: /stock solutions/i }, firstRender);
    await user.click(
      within(table).getByRole('button', { name: 'Change the Rockpool teal 1 % jar' }),
    );
    const form = screen.getByRole('form', { name: 'Change the Rockpool teal jar' });
    // Opened from the row, the form takes the focus wherever it sits on the page.
    expect(within(form).getByLabelText('Dye')).toHaveFocus();
    const strength = within(form).getByLabelText(/Strength/);
    expect(strength).toHaveValue(1);
    await user.clear(strength);
    await user.type(strength, '2');
    await user.click(within(form).getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByRole('form', { name: 'Add a stock solution' })).toBeVisible();
    expect(sent).toEqual([
      { dyeId: tealDye.id, stockStrengthPct: 2, volumeMadeMl: 500, madeOn: '2025-04-01' },
    ]);
    expect(await within(table).findByText('10 g of dye')).toBeVisible();
  });
});
