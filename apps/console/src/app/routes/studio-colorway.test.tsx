import { screen, within } from '@testing-library/react';
import type {
  ColorwaySummary,
  ColorwayUpdate,
  StepOrder,
  StepUpdate,
} from '@vatside/contracts/workbench-colorways';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe } from '../../testing/fixtures.ts';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import {
  computedFor,
  detailOf,
  merinoBase,
  steps,
  studioApi,
  tealDye,
  tealStock,
  tidePool,
  workbenchAsHost,
} from '../../testing/workbench-fixtures.ts';

const page = `/studios/kelpwhistle-dyeworks/colorways/${tidePool.id}`;
const colorwayApi = `${studioApi}/colorways/${tidePool.id}`;

function openColorway(initialSteps = steps) {
  signIn(hostMe);
  workbenchAsHost({ bases: [merinoBase], stocks: [tealStock], dyes: [tealDye] });
  let colorway: ColorwaySummary = tidePool;
  server.use(
    http.get(colorwayApi, () => HttpResponse.json(detailOf(colorway))),
    http.get(`${colorwayApi}/steps`, () => HttpResponse.json({ steps: initialSteps })),
  );
  return { save: (next: ColorwaySummary) => (colorway = next) };
}

describe('Colorway editor', { timeout: 30_000 }, () => {
  it('saves two recipe lines and shows the amounts the server works out', async () => {
    const colorway = openColorway();
    let sent: ColorwayUpdate | undefined;
    server.use(
      http.patch(colorwayApi, async ({ request }) => {
        sent = (await request.json()) as ColorwayUpdate;
        const saved: ColorwaySummary = {
          ...tidePool,
          recipeLines: [
            {
              id: 'c0ffee00-0000-4000-8000-000000000001',
              kind: 'stock',
              stockSolutionId: tealStock.id,
              dyeName: 'Rockpool teal',
              stockStrengthPct: 1,
              depthOfShadePct: 1.5,
            },
            {
              id: 'c0ffee00-0000-4000-8000-000000000002',
              kind: 'foodColor',
              dyeId: null,
              colorName: 'Lemon gel',
              amountPer100g: 0.5,
              unit: 'gGel',
            },
          ],
        };
        colorway.save(saved);
        return HttpResponse.json(saved);
      }),
    );
    const { user } = renderApp(page);

    const amounts = await screen.findByRole('region', { name: 'Amounts' }, firstRender);
    expect(within(amounts).getByText('Water for the bath')).toBeInTheDocument();
    const form = screen.getByRole('form', { name: 'Colorway recipe' });
    const line1 = () => within(form).getByRole('group', { name: 'Line 1' });
    const line2 = () => within(form).getByRole('group', { name: 'Line 2' });

    await user.click(within(form).getByRole('button', { name: 'Add a stock solution line' }));
    await user.selectOptions(within(line1()).getByLabelText('Stock solution'), tealStock.id);
    await user.clear(within(line1()).getByLabelText('Depth of shade'));
    await user.type(within(line1()).getByLabelText('Depth of shade'), '1.5');

    await user.click(within(form).getByRole('button', { name: 'Add a food color line' }));
    await user.type(within(line2()).getByLabelText('Color name'), 'Lemon gel');
    await user.clear(within(line2()).getByLabelText('Amount per 100 g'));
    await user.type(within(line2()).getByLabelText('Amount per 100 g'), '0.5');
    await user.selectOptions(within(line2()).getByLabelText('Measured in'), 'gGel');
    await user.click(within(form).getByRole('button', { name: 'Save recipe' }));

    expect(await within(form).findByText(/Saved\./)).toBeInTheDocument();
    expect(sent?.recipeLines).toEqual([
      { kind: 'stock', stockSolutionId: tealStock.id, depthOfShadePct: 1.5 },
      { kind: 'foodColor', dyeId: null, colorName: 'Lemon gel', amountPer100g: 0.5, unit: 'gGel' },
    ]);
    // 100 g at 1.5 % from a 1 % stock is 150 mL holding 1.5 g of dye; 0.5 g of gel per 100 g.
    const teal = await within(amounts).findByRole('row', { name: /Rockpool teal/ });
    expect(teal).toHaveTextContent('150 mLof stock · 1.5 g dye');
    expect(within(amounts).getByRole('row', { name: /Lemon gel/ })).toHaveTextContent(
      '0.5 gof gel',
    );
  });

  it('shows amounts for a 115 g skein from the amounts route', async () => {
    openColorway();
    const withLine: ColorwaySummary = {
      ...tidePool,
      recipeLines: [
        {
          id: 'c0ffee00-0000-4000-8000-000000000001',
          kind: 'stock',
          stockSolutionId: null,
          dyeName: 'Rockpool teal',
          stockStrengthPct: 1,
          depthOfShadePct: 2,
        },
      ],
    };
    let asked: string | null = null;
    server.use(
      http.get(`${colorwayApi}/amounts`, ({ request }) => {
        asked = new URL(request.url).searchParams.get('weightOfGoodsG');
        return HttpResponse.json(computedFor(withLine, Number(asked)));
      }),
    );
    const { user } = renderApp(page);

    const box = await screen.findByRole('region', { name: 'Another skein' }, firstRender);
    await user.click(within(box).getByRole('button', { name: 'Work out amounts' }));

    expect(await within(box).findByRole('row', { name: /Rockpool teal/ })).toHaveTextContent(
      '230 mLof stock · 2.3 g dye',
    );
    expect(asked).toBe('115');
  });

  it('moves a run-sheet step up with the keyboard and saves the new order', async () => {
    openColorway();
    let sent: StepOrder | undefined;
    server.use(
      http.put(`${colorwayApi}/steps/order`, async ({ request }) => {
        sent = (await request.json()) as StepOrder;
        const byId = new Map(steps.map((s) => [s.id, s]));
        return HttpResponse.json({
          steps: sent.stepIds.map((id, position) => ({ ...byId.get(id)!, position })),
        });
      }),
    );
    const { user } = renderApp(page);

    const sheet = await screen.findByRole('list', { name: 'Run sheet' }, firstRender);
    within(sheet).getByRole('button', { name: 'Move step 3 up' }).focus();
    await user.keyboard('{Enter}');

    expect(sent).toEqual({ stepIds: [steps[0]!.id, steps[2]!.id, steps[1]!.id] });
    const items = Array.from(sheet.children);
    expect(items.map((li) => li.querySelector('p')?.textContent)).toEqual([
      '1Soak the skein',
      '2Add the dye',
      '3Heat the bath',
    ]);
    expect(items[2]).toHaveTextContent('Caution · Hot bath');
    expect(items[2]).toHaveTextContent('85 °C / 185 °F · Steady steam, no rolling boil');
  });

  it('changes a step in place: an untouched timer is kept, a typed one is read as min:sec', async () => {
    openColorway();
    const sent: StepUpdate[] = [];
    server.use(
      http.patch(`${colorwayApi}/steps/:stepId`, async ({ request, params }) => {
        const patch = (await request.json()) as StepUpdate;
        sent.push(patch);
        const step = steps.find((s) => s.id === params.stepId)!;
        return HttpResponse.json({ ...step, ...patch });
      }),
    );
    const { user } = renderApp(page);
    const sheet = await screen.findByRole('list', { name: 'Run sheet' }, firstRender);

    // Step 1 holds a 30-minute timer (1800 s): the form shows it as min:sec.
    await user.click(within(sheet).getByRole('button', { name: 'Change step 1' }));
    const form = screen.getByRole('form', { name: 'Change step 1' });
    expect(within(form).getByLabelText(/Timer/)).toHaveValue('30:00');
    const instruction = within(form).getByLabelText('What to do');
    expect(instruction).toHaveFocus();
    await user.clear(instruction);
    await user.type(instruction, 'Soak the skein in lukewarm water');
    await user.click(within(form).getByRole('button', { name: 'Save changes' }));
    expect(sent.at(-1)).toMatchObject({
      instruction: 'Soak the skein in lukewarm water',
      timerSeconds: 1800,
    });
    // Saved, the form closes and the add form is back.
    await screen.findByRole('form', { name: 'Add a step' });

    await user.click(within(sheet).getByRole('button', { name: 'Change step 2' }));
    const second = screen.getByRole('form', { name: 'Change step 2' });
    await user.type(within(second).getByLabelText(/Timer/), '12:30');
    await user.click(within(second).getByRole('button', { name: 'Save changes' }));
    expect(sent.at(-1)).toMatchObject({ timerSeconds: 750, temperatureC: 85, caution: 'hotBath' });
  });
});
