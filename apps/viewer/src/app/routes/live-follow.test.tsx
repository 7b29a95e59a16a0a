import { act, cleanup, screen, waitFor, within } from '@testing-library/react';
import type { LiveState } from '@vatside/contracts/live';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeServer } from '../../testing/fake-socket.ts';
import { adaMe } from '../../testing/fixtures.ts';
import { liveState, program, rockPot, seaPot, sessionId } from '../../testing/live-fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

vi.mock('socket.io-client', async () => ({
  io: (await import('../../testing/fake-socket.ts')).fakeIo,
}));

const livePath = `/live/${sessionId}`;
const pot = (name: string) => screen.getByRole('region', { name });
const findPot = (name: string) => screen.findByRole('region', { name });

/** Lets queued acks and cache notifications run. */
const settle = () => act(() => new Promise((resolve) => setTimeout(resolve, 30)));

// The route module is lazy: transform it once up front, not inside the first test's timeout.
beforeAll(() => import('./live-follow.tsx'), 30_000);

beforeEach(() => {
  localStorage.clear();
  fakeServer.reset();
  fakeServer.state = liveState();
  server.use(http.get(`/api/live-sessions/${sessionId}/program`, () => HttpResponse.json(program)));
});

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('Follow-along', () => {
  it('shows each pot’s step and the amounts for a 50 g skein in US measures', async () => {
    signIn({ ...adaMe, profile: { ...adaMe.profile, defaultSkeinWeightG: 50, unitSystem: 'us' } });
    renderApp(livePath);

    const sea = await findPot('Sea Glass');
    expect(await within(sea).findByText('Step 2 of 3')).toBeVisible();
    expect(within(sea).getByText('Stir the turquoise stock into the pot')).toBeVisible();
    // 50 g × 2 % depth of shade ÷ 1 % stock = 100 mL (common practice).
    expect(await within(sea).findByText('100 mL')).toBeVisible();
    expect(within(sea).getByText('of turquoise stock at 1 %')).toBeVisible();
    expect(within(sea).getByText(/\(US spoons\)$/)).toBeVisible();
    expect(within(sea).getByText('Lower the yarn in and hold just under a simmer')).toBeVisible();
    // The pot's target colors, each named: a color is never shown without words.
    const colors = within(sea).getByRole('list', { name: 'Colors of Sea Glass' });
    expect(
      within(colors)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['Frosted green', 'Pale sea']);

    const rock = pot('Rock Pool');
    expect(within(rock).queryByRole('list', { name: /^Colors of/ })).toBeNull();
    expect(within(rock).getByText('Drip the sky blue over the crown of the skein')).toBeVisible();
    // 10 drops per 100 g × 50 g = 5 drops, with a 20-drops-per-mL dropper on both sides.
    expect(within(rock).getByText('5 drops')).toBeVisible();
    expect(within(rock).getByRole('timer', { name: 'Rock Pool timer' })).toHaveTextContent('10:00');
    expect(fakeServer.socket.sent('live:join')).toEqual([{ sessionId }]);
    expect(
      screen.getByRole('link', { name: 'Watch the stream (opens in a new tab)' }),
    ).toHaveAttribute('target', '_blank');
  });

  it('counts down to the server’s end time on a phone whose clock is 90 s fast', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    const serverTimeMs = Date.UTC(2025, 4, 10, 17, 0, 0);
    vi.setSystemTime(serverTimeMs + 90_000);
    fakeServer.clockAheadMs = -90_000;
    fakeServer.state = liveState({
      pots: [
        seaPot(),
        rockPot({
          timer: {
            state: 'running',
            durationMs: 600_000,
            startedAtMs: serverTimeMs - 300_000,
            endsAtMs: serverTimeMs + 300_000,
          },
        }),
      ],
    });
    renderApp(livePath);

    const timer = await screen.findByRole('timer', { name: 'Rock Pool timer' });
    // Read from the phone's own clock it would say 3:30.
    await waitFor(() => expect(timer).toHaveTextContent('5:00'));
    expect(timer).toHaveTextContent('Counting down');
    expect(fakeServer.socket.sent('clock:ping').length).toBeGreaterThanOrEqual(3);
  });

  it('ignores a state older than the one on screen and takes a newer one', async () => {
    renderApp(livePath);
    await findPot('Rock Pool');
    await waitFor(() => expect(within(pot('Rock Pool')).getByText('Step 1 of 2')).toBeVisible());

    const older: LiveState = liveState({
      revision: 4,
      pots: [seaPot(), rockPot({ stepIndex: 1 })],
    });
    act(() => fakeServer.socket.fire('live:state', older));
    await settle();
    expect(within(pot('Rock Pool')).getByText('Step 1 of 2')).toBeVisible();

    const newer: LiveState = liveState({
      revision: 6,
      pots: [seaPot(), rockPot({ stepIndex: 1 })],
    });
    act(() => fakeServer.socket.fire('live:state', newer));
    expect(await within(pot('Rock Pool')).findByText('Step 2 of 2')).toBeVisible();
  });

  it('says when it is offline, and on reconnect joins again and shows the state at once', async () => {
    renderApp(livePath);
    await waitFor(() => expect(within(pot('Sea Glass')).getByText('Step 2 of 3')).toBeVisible());
    expect(screen.queryByText('Offline — reconnecting…')).not.toBeInTheDocument();

    act(() => fakeServer.socket.drop());
    expect(await screen.findByText('Offline — reconnecting…')).toBeVisible();

    // Meanwhile the host moved on; the snapshot on rejoin carries it, no push needed.
    fakeServer.state = liveState({
      revision: 9,
      pots: [seaPot({ stepIndex: 2 }), rockPot()],
      notes: [{ id: 'n1', atMs: Date.now(), text: 'Sea Glass goes in now' }],
    });
    act(() => fakeServer.socket.connect());

    expect(await within(pot('Sea Glass')).findByText('Step 3 of 3')).toBeVisible();
    expect(screen.getByText('Sea Glass goes in now')).toBeVisible();
    expect(screen.queryByText('Offline — reconnecting…')).not.toBeInTheDocument();
    expect(fakeServer.socket.sent('live:join')).toHaveLength(2);
  });

  it('runs a pot at the viewer’s own pace without touching the host’s pots', async () => {
    const { user } = renderApp(livePath);
    await waitFor(() => expect(within(pot('Sea Glass')).getByText('Step 2 of 3')).toBeVisible());
    expect(within(pot('Sea Glass')).queryByRole('button', { name: 'Next step' })).toBeNull();

    await user.click(within(pot('Sea Glass')).getByRole('button', { name: 'Go at my own pace' }));
    await user.click(within(pot('Sea Glass')).getByRole('button', { name: 'Next step' }));

    const sea = pot('Sea Glass');
    expect(within(sea).getByText('Step 3 of 3')).toBeVisible();
    expect(within(sea).getByText('Your own pace')).toBeVisible();
    expect(within(sea).getByRole('timer', { name: 'Sea Glass timer' })).toHaveTextContent('20:00');
    expect(within(pot('Rock Pool')).getByText('Step 1 of 2')).toBeVisible();
    expect(within(pot('Rock Pool')).queryByRole('button', { name: 'Next step' })).toBeNull();

    // The host moves both pots: only the one still with the host follows.
    act(() =>
      fakeServer.socket.fire(
        'live:state',
        liveState({ revision: 6, pots: [seaPot({ stepIndex: 0 }), rockPot({ stepIndex: 1 })] }),
      ),
    );
    expect(await within(pot('Rock Pool')).findByText('Step 2 of 2')).toBeVisible();
    expect(within(pot('Sea Glass')).getByText('Step 3 of 3')).toBeVisible();
    expect(within(pot('Sea Glass')).getByText('The host is on step 1 of 3.')).toBeVisible();

    // Remembered on this phone for this session.
    cleanup();
    const again = renderApp(livePath);
    expect(await within(await findPot('Sea Glass')).findByText('Step 3 of 3')).toBeVisible();

    await again.user.click(
      within(pot('Sea Glass')).getByRole('button', { name: 'Back to the host' }),
    );
    expect(await within(pot('Sea Glass')).findByText('Step 2 of 3')).toBeVisible();
  });

  it('asks once to turn on sound, and remembers the answer', async () => {
    const resume = vi.fn(() => Promise.resolve());
    const oscillators: unknown[] = [];
    vi.stubGlobal(
      'AudioContext',
      class {
        currentTime = 0;
        destination = {};
        resume = resume;
        createOscillator() {
          const oscillator = {
            frequency: {},
            connect: (node: unknown) => node,
            start() {},
            stop() {},
          };
          oscillators.push(oscillator);
          return oscillator;
        }
        createGain() {
          const ramp = () => undefined;
          return {
            gain: { setValueAtTime: ramp, exponentialRampToValueAtTime: ramp },
            connect: (node: unknown) => node,
          };
        }
      },
    );
    const { user } = renderApp(livePath);

    const prompt = await screen.findByRole('region', { name: 'Timer sound' });
    await user.click(within(prompt).getByRole('button', { name: 'Turn on sound' }));

    expect(screen.queryByRole('region', { name: 'Timer sound' })).not.toBeInTheDocument();
    expect(resume).toHaveBeenCalled();
    expect(oscillators.length).toBeGreaterThan(0);
    expect(screen.getByText('on')).toBeVisible();

    cleanup();
    renderApp(livePath);
    await findPot('Sea Glass');
    expect(screen.queryByRole('region', { name: 'Timer sound' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Turn off sound' })).toBeVisible();
  });

  it('buzzes when a host timer runs out while the viewer watches', async () => {
    const vibrate = vi.fn(() => true);
    Object.defineProperty(navigator, 'vibrate', { value: vibrate, configurable: true });
    fakeServer.state = liveState({
      pots: [
        seaPot(),
        rockPot({
          timer: {
            state: 'running',
            durationMs: 600_000,
            startedAtMs: Date.now() - 598_800,
            endsAtMs: Date.now() + 1_200,
          },
        }),
      ],
    });
    renderApp(livePath);

    const timer = await screen.findByRole('timer', { name: 'Rock Pool timer' });
    expect(vibrate).not.toHaveBeenCalled();
    await waitFor(() => expect(timer).toHaveTextContent('Time’s up'), { timeout: 3_000 });
    await waitFor(() => expect(vibrate).toHaveBeenCalledTimes(1));
    Reflect.deleteProperty(navigator, 'vibrate');
  });

  it('shows the newest notes first, and says kindly when the session has ended', async () => {
    fakeServer.state = liveState({
      status: 'ended',
      notes: ['First', 'Second', 'Third', 'Fourth'].map((text, i) => ({
        id: `n${i}`,
        atMs: Date.UTC(2025, 4, 10, 17, i),
        text,
      })),
    });
    renderApp(livePath);

    expect(
      await screen.findByText('The live dye-along has ended. Thank you for dyeing along!'),
    ).toBeVisible();
    const notes = within(screen.getByRole('region', { name: 'Notes from the host' }));
    expect(notes.getAllByText(/^(First|Second|Third|Fourth)$/).map((n) => n.textContent)).toEqual([
      'Fourth',
      'Third',
      'Second',
    ]);
    expect(screen.getAllByRole('button', { name: 'Go at my own pace' })).toHaveLength(2);
  });

  it('explains a refused join', async () => {
    fakeServer.refusal = {
      error: { code: 'FORBIDDEN', message: 'Only the studio’s host can follow a rehearsal.' },
    };
    renderApp(livePath);
    expect(
      await screen.findByRole('heading', { name: 'This is a private rehearsal' }),
    ).toBeVisible();
    expect(screen.getByText('Only the studio’s host can follow a rehearsal.')).toBeVisible();
  });

  it('uses the kit the viewer sets, and remembers it', async () => {
    const { user } = renderApp(livePath);
    await waitFor(() => expect(within(pot('Sea Glass')).getByText('200 mL')).toBeVisible());

    await user.click(screen.getByText('My kit'));
    const weight = screen.getByRole('textbox', { name: 'Dry weight of your skein (g)' });
    await user.clear(weight);
    await user.type(weight, '150');
    await user.click(screen.getByRole('radio', { name: 'Metric spoons' }));

    expect(screen.getByText('That is 5.29 oz.')).toBeVisible();
    expect(within(pot('Sea Glass')).getByText('300 mL')).toBeVisible();
    expect(within(pot('Sea Glass')).getByText(/\(metric spoons\)$/)).toBeVisible();
    expect(JSON.parse(localStorage.getItem('vatside.kit') ?? 'null')).toMatchObject({
      skeinWeightG: 150,
      system: 'metric',
    });
  });
});
