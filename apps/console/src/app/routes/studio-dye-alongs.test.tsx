import { fireEvent, screen, within } from '@testing-library/react';
import type { DyeAlongCreate } from '@vatside/contracts/dye-alongs';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import {
  draftDetail,
  dyeAlongApi,
  dyeAlongId,
  poolTealId,
  suppliesHandler,
} from '../../testing/dye-along-fixtures.ts';
import { hostMe } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import {
  rockpoolImage,
  studioApi,
  tidePool,
  workbenchAsHost,
} from '../../testing/workbench-fixtures.ts';

const studioPath = '/studios/kelpwhistle-dyeworks';
// The first screen waits for its lazy route module.
const firstLoad = { timeout: 5_000 };
const halifaxHost = { ...hostMe, profile: { ...hostMe.profile, timeZone: 'America/Halifax' } };

function asHost() {
  signIn(halifaxHost);
  workbenchAsHost({ colorways: [tidePool], images: [rockpoolImage] });
  suppliesHandler();
}

describe('Planning a dye-along', () => {
  it('posts the start as the host’s wall clock with its zone, and shows the same moment in UTC', async () => {
    asHost();
    let sent: DyeAlongCreate | undefined;
    server.use(
      http.post(`${studioApi}/dye-alongs`, async ({ request }) => {
        sent = (await request.json()) as DyeAlongCreate;
        return HttpResponse.json(draftDetail(), { status: 201 });
      }),
      http.get(dyeAlongApi, () => HttpResponse.json(draftDetail())),
    );
    const { user, router } = renderApp(`${studioPath}/dye-alongs/new`);

    await user.type(await screen.findByLabelText('Title', {}, firstLoad), 'Tide pool month');
    fireEvent.change(screen.getByLabelText('Starts at (on your clock)'), {
      target: { value: '2026-12-12T14:00' },
    });
    expect(screen.getByLabelText('Time zone')).toHaveValue('America/Halifax');
    // 2 PM Atlantic Standard Time (UTC−4 in December) is 6 PM UTC and 3 AM next day in Tokyo
    // (UTC+9), worked by hand.
    expect(screen.getAllByText('UTC:')[0]?.parentElement).toHaveTextContent(
      'UTC: Sat, Dec 12, 2026, 6:00 PM',
    );
    // A plain change event: user-event walks all ~400 options of a zone list, slowly in jsdom.
    fireEvent.change(screen.getByLabelText('Also show it in'), { target: { value: 'Asia/Tokyo' } });
    expect(screen.getByText('Asia/Tokyo:').parentElement).toHaveTextContent(
      'Asia/Tokyo: Sun, Dec 13, 2026, 3:00 AM',
    );
    await user.click(screen.getByLabelText('Low tide'));
    await user.click(screen.getByLabelText(/Image 1/));
    await user.click(screen.getByRole('button', { name: 'Save as draft' }));

    await screen.findByRole('heading', { name: 'Tide pool month', level: 2 }, firstLoad);
    expect(sent).toEqual({
      title: 'Tide pool month',
      description: '',
      startsAtLocal: '2026-12-12T14:00',
      timeZone: 'America/Halifax',
      expectedLengthMin: 90,
      streamUrl: null,
      inspirationImageId: rockpoolImage.id,
      colorwayIds: [tidePool.id],
      shareOpensAt: null,
      shareClosesAt: null,
      hostPrepItems: [],
    });
    expect(router.state.location.pathname).toBe(`/console${studioPath}/dye-alongs/${dyeAlongId}`);
  }, 20_000);

  it('shows the server’s reason when it refuses to announce', async () => {
    asHost();
    let asked = 0;
    server.use(
      http.get(dyeAlongApi, () =>
        HttpResponse.json(
          draftDetail({
            nextStatuses: [{ to: 'announced', allowed: true, reasons: [] }],
          }),
        ),
      ),
      http.post(`${dyeAlongApi}/transitions`, () => {
        asked += 1;
        return HttpResponse.json(
          {
            error: {
              code: 'CONFLICT',
              message:
                'It cannot move from draft to announced: Its start time has passed; set a start in the future.',
            },
          },
          { status: 409 },
        );
      }),
    );
    const { user } = renderApp(`${studioPath}/dye-alongs/${dyeAlongId}`);

    await user.click(
      await screen.findByRole('button', { name: 'Announce and e-mail followers' }, firstLoad),
    );
    // Announcing e-mails everyone: nothing is sent before the second press.
    expect(asked).toBe(0);
    await user.click(screen.getByRole('button', { name: 'Yes, announce and send the e-mails' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('That move was refused.');
    expect(alert).toHaveTextContent('Its start time has passed; set a start in the future.');
    expect(asked).toBe(1);
  });

  it('lists why a move is not open yet, from the detail', async () => {
    asHost();
    server.use(
      http.get(dyeAlongApi, () =>
        HttpResponse.json(
          draftDetail({
            nextStatuses: [
              { to: 'announced', allowed: false, reasons: ['Add at least one colorway.'] },
            ],
          }),
        ),
      ),
    );
    renderApp(`${studioPath}/dye-alongs/${dyeAlongId}`);

    const button = await screen.findByRole(
      'button',
      { name: 'Announce and e-mail followers' },
      firstLoad,
    );
    expect(button).toBeDisabled();
    expect(button).toHaveAccessibleDescription(/Add at least one colorway\./);
  });
});

describe('Recipe card', () => {
  it('shows the amounts for a 50 g skein and switches the paper size', async () => {
    signIn(hostMe);
    workbenchAsHost();
    suppliesHandler();
    server.use(
      http.get(dyeAlongApi, () => HttpResponse.json(draftDetail())),
      http.get(`${studioApi}/colorways/${poolTealId}/steps`, () =>
        HttpResponse.json({ steps: [] }),
      ),
    );
    const { user } = renderApp(`${studioPath}/dye-alongs/${dyeAlongId}/recipe-card/${poolTealId}`);

    const card = await screen.findByRole('article', { name: 'Pool Teal' }, firstLoad);
    const weights = within(card).getByRole('region', { name: 'For other skein weights' });
    const headers = within(weights)
      .getAllByRole('columnheader')
      .map((th) => th.textContent);
    expect(headers).toEqual([
      'What',
      '50 g (1.76 oz)',
      '100 g (3.53 oz)',
      '115 g (4.06 oz)',
      '150 g (5.29 oz)',
    ]);
    // 1 % depth of shade from a 1 % stock: 50 g of fiber takes 50 mL, about 3 tbsp + 1 ⅛ tsp.
    const stockRow = within(weights).getByRole('row', { name: /Brinewell Blue \(stock\)/ });
    const [fiftyGrams] = within(stockRow).getAllByRole('cell');
    expect(fiftyGrams).toHaveTextContent('3 tbsp + 1 ⅛ tsp');
    expect(fiftyGrams).toHaveTextContent('50 mL');

    // US measures in the profile: US Letter first; A4 is one choice away.
    expect(card).toHaveClass('vs-paper-letter');
    await user.selectOptions(screen.getByLabelText('Paper'), 'A4');
    expect(card).toHaveClass('vs-paper-a4');
    expect(card).not.toHaveClass('vs-paper-letter');
    expect(screen.getByRole('button', { name: 'Print this card' })).toBeVisible();
  });
});
