import { screen, within } from '@testing-library/react';
import type { ProfileUpdate } from '@vatside/contracts/account';
import { deviceTimeZone } from '@vatside/ui/account/time-zones.ts';
import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it } from 'vitest';
import { dyeAlongApi, dyeAlongPath, publicPage } from '../../testing/dye-along-fixtures.ts';
import { adaMe, kelpwhistleDetail } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

// The first screen waits for its lazy route module.
const firstLoad = { timeout: 5_000 };
const tokyoAda = {
  ...adaMe,
  profile: {
    ...adaMe.profile,
    timeZone: 'Asia/Tokyo',
    unitSystem: 'us' as const,
    defaultSkeinWeightG: 50,
  },
};

/** The public page for whatever skein and measures the page asks about; records each ask. */
function servePage() {
  const asked: URLSearchParams[] = [];
  server.use(
    http.get(`/api/studios/${kelpwhistleDetail().slug}`, () =>
      HttpResponse.json(kelpwhistleDetail()),
    ),
    http.get(`${dyeAlongApi}/public`, ({ request }) => {
      const query = new URL(request.url).searchParams;
      asked.push(query);
      const system = query.get('system') === 'metric' ? 'metric' : 'us';
      return HttpResponse.json(publicPage(Number(query.get('weightOfGoodsG')), system));
    }),
  );
  return asked;
}

const stockItem = () =>
  screen.getByText('Brinewell Blue, 1 % stock solution').closest('li') as HTMLElement;

afterEach(() => localStorage.clear());

describe('A dye-along’s page', () => {
  it('shows the start on the reader’s clock and amounts for their 50 g skein in US measures', async () => {
    signIn(tokyoAda);
    const asked = servePage();
    renderApp(dyeAlongPath);

    await screen.findByRole('heading', { name: 'Tide pool month', level: 1 }, firstLoad);
    // 18:00 UTC on December 12 is 3:00 AM on December 13 in Tokyo (UTC+9), worked by hand.
    const start = screen.getByRole('region', { name: 'Starts on your clock' });
    expect(start).toHaveTextContent('Sunday, December 13, 2026');
    expect(start).toHaveTextContent('3:00 AM GMT+9');
    expect(start).toHaveTextContent('Your time zone: Asia/Tokyo');
    expect(start).toHaveTextContent('Saturday, December 12, 2026, 2:00 PM AST (America/Halifax)');
    expect(within(start).getByRole('link', { name: 'Add to calendar' })).toHaveAttribute(
      'href',
      `${dyeAlongApi}/calendar.ics`,
    );

    // A 1 % stock at 1 % depth of shade: 50 mL for 50 g, which US spoons measure as 3 tbsp + 1 ⅛ tsp.
    expect(stockItem()).toHaveTextContent('3 tbsp + 1 ⅛ tsp');
    expect(stockItem()).toHaveTextContent('50 mL');
    expect(screen.getByText('1 × 50 g (1.76 oz)')).toBeVisible();
    expect(asked.at(-1)?.toString()).toBe('weightOfGoodsG=50&system=us&timeZone=Asia%2FTokyo');
  });

  it('lets a visitor pick a skein and metric measures, and remembers them on the phone', async () => {
    const asked = servePage();
    const { user } = renderApp(dyeAlongPath);

    await screen.findByRole('heading', { name: 'Tide pool month', level: 1 }, firstLoad);
    expect(asked[0]?.get('weightOfGoodsG')).toBe('100');
    expect(asked[0]?.get('timeZone')).toBe(deviceTimeZone());
    await user.click(screen.getByRole('button', { name: '50 g' }));
    await user.click(screen.getByRole('button', { name: 'Metric' }));

    await screen.findByText('1 × 50 g');
    expect(stockItem()).toHaveTextContent('50 mL');
    expect(screen.getByRole('button', { name: '50 g' })).toHaveAttribute('aria-pressed', 'true');
    // The same kit the live follow-along reads on the day.
    expect(JSON.parse(localStorage.getItem('vatside.kit') ?? '{}')).toMatchObject({
      skeinWeightG: 50,
      system: 'metric',
    });
    expect(screen.getByRole('link', { name: 'Sign in to follow' })).toBeVisible();
  });

  it('saves a signed-in reader’s skein weight to their profile', async () => {
    signIn(tokyoAda);
    servePage();
    let sent: ProfileUpdate | undefined;
    server.use(
      http.patch('/api/me/profile', async ({ request }) => {
        sent = (await request.json()) as ProfileUpdate;
        return HttpResponse.json({ ...tokyoAda.profile, ...sent });
      }),
    );
    const { user } = renderApp(dyeAlongPath);

    await user.click(await screen.findByRole('button', { name: '115 g' }, firstLoad));
    await screen.findByText('1 × 115 g (4.06 oz)');
    expect(sent).toEqual({ defaultSkeinWeightG: 115 });
  });
});
