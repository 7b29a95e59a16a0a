import { act, screen, waitFor, within } from '@testing-library/react';
import type { LiveState } from '@vatside/contracts/live';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { FakeLiveSocket } from '../../testing/fake-live-socket.ts';
import {
  boardAsHost,
  boardPath,
  fakeLiveServer,
  initialState,
  program,
  sessionId,
} from '../../testing/live-fixtures.ts';
import type * as SocketModule from '../../features/live/socket.ts';
import { renderApp } from '../../testing/render-app.tsx';

const opened = vi.hoisted(() => ({ socket: undefined as unknown }));
vi.mock('../../features/live/socket.ts', async (importOriginal) => ({
  ...(await importOriginal<typeof SocketModule>()),
  openHostSocket: () => opened.socket,
}));

const [lowTide, kelpShade] = program.pots as [
  (typeof program.pots)[number],
  (typeof program.pots)[number],
];

function openBoard(state: LiveState = initialState(), options?: { serverAheadMs?: number }) {
  boardAsHost();
  const server = fakeLiveServer(state, options);
  opened.socket = server.socket;
  const { user } = renderApp(boardPath);
  return { user, server, socket: server.socket };
}

/** The pot's card: a region named "Pot 1 · Low tide". */
const pot = (number: number) =>
  screen.getByRole('region', { name: new RegExp(`^Pot ${number} ·`) });

async function boardReady() {
  // The first render loads the lazy route and socket.io-client: allow it a moment.
  await screen.findByRole('region', { name: /^Pot 1 ·/ }, { timeout: 10_000 });
}

/** A server event, then one turn of the event loop: the query cache tells React on a timer. */
async function serverSays(socket: FakeLiveSocket, event: string, payload: unknown) {
  await act(async () => {
    socket.fire(event, payload);
    await new Promise((resolve) => setTimeout(resolve, 20));
  });
}

afterEach(() => {
  vi.useRealTimers();
});

describe('Pot board', () => {
  it(
    'advances a pot with live:action step:next and shows its new step',
    { timeout: 15_000 },
    async () => {
      const { user, socket } = openBoard();
      await boardReady();
      expect(within(pot(1)).getByText('Presoak the yarn in lukewarm water.')).toBeInTheDocument();

      await user.click(within(pot(1)).getByRole('button', { name: 'Next step →' }));

      // The step on screen goes along, so a second tap before the board updates is refused.
      expect(socket.actions()).toEqual([{ type: 'step:next', potId: lowTide.potId, fromStep: 0 }]);
      expect(await within(pot(1)).findByText('Heat the bath to a simmer.')).toBeInTheDocument();
      expect(within(pot(1)).getByText(/Step 2 of 3/)).toBeInTheDocument();
      expect(within(pot(1)).getByText(/Caution · Hot bath/)).toBeInTheDocument();
      // The other pot stays where it was.
      expect(within(pot(2)).getByText(/Step 1 of 2/)).toBeInTheDocument();
    },
  );

  it('shows the server’s refusal beside the pot it concerns, then lets it fade', async () => {
    const start = initialState();
    start.pots[1] = { ...start.pots[1]!, stepIndex: 1 };
    const { user } = openBoard(start);
    await boardReady();

    await user.click(within(pot(2)).getByRole('button', { name: 'Next step →' }));

    const refusal = await within(pot(2)).findByRole('alert');
    expect(refusal).toHaveTextContent('This pot is on its last step.');
    expect(within(pot(1)).queryByRole('alert')).not.toBeInTheDocument();
    await waitFor(() => expect(within(pot(2)).queryByRole('alert')).not.toBeInTheDocument(), {
      timeout: 8000,
    });
  }, 12_000);

  it('shows the amount for the host’s skein with metric and kitchen measures', async () => {
    const start = initialState();
    start.pots[0] = { ...start.pots[0]!, stepIndex: 2 };
    openBoard(start);
    await boardReady();
    // 0.5 % depth of shade on 100 g is 0.5 g of dye: 50 mL of a 1 % stock.
    expect(
      within(pot(1)).getByText('50 mL of stock (0.5 g dye)', { exact: false }),
    ).toBeInTheDocument();
    expect(within(pot(1)).getByText('Measure for your 100 g skein')).toBeInTheDocument();
  });

  it('drives the chosen pot from the keyboard', async () => {
    const { user, socket } = openBoard();
    await boardReady();

    await user.keyboard('n');
    expect(socket.actions()).toEqual([]);
    expect(screen.getByText('Press a pot’s number first.')).toBeInTheDocument();

    await user.keyboard('2');
    expect(pot(2)).toHaveFocus();
    await user.keyboard('n');
    await within(pot(2)).findByText(/Step 2 of 2/);
    await user.keyboard(' ');
    await within(pot(2)).findByText('Counting down');
    await user.keyboard('=');
    await user.keyboard('{Shift>}+{/Shift}');
    await user.keyboard('p');
    await user.keyboard('1');
    await user.keyboard('n');

    await waitFor(() =>
      expect(socket.actions()).toEqual([
        { type: 'step:next', potId: kelpShade.potId, fromStep: 0 },
        { type: 'timer:start', potId: kelpShade.potId },
        { type: 'timer:extend', potId: kelpShade.potId, byMs: 60_000 },
        { type: 'timer:extend', potId: kelpShade.potId, byMs: 300_000 },
        { type: 'step:previous', potId: kelpShade.potId, fromStep: 1 },
        { type: 'step:next', potId: lowTide.potId, fromStep: 0 },
      ]),
    );
  });

  it('leaves Space to a focused button and typing to the note box', async () => {
    const { user, socket } = openBoard();
    await boardReady();
    await user.keyboard('1');
    await user.tab();
    expect(within(pot(1)).getByRole('button', { name: '← Previous step' })).toHaveFocus();
    await user.keyboard(' ');
    await within(pot(1)).findByRole('alert');

    await user.click(screen.getByLabelText('Note'));
    await user.keyboard('n 2');
    expect(screen.getByLabelText('Note')).toHaveValue('n 2');
    expect(socket.actions()).toEqual([
      { type: 'step:previous', potId: lowTide.potId, fromStep: 0 },
    ]);
  });

  it('counts down on the server’s clock, not this machine’s', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    const laptopNow = Date.parse('2026-12-12T18:00:00Z');
    vi.setSystemTime(laptopNow);
    const serverAheadMs = 90_000;
    const start = initialState();
    const serverNow = laptopNow + serverAheadMs;
    start.pots[0] = {
      ...start.pots[0]!,
      timer: {
        state: 'running',
        durationMs: 300_000,
        startedAtMs: serverNow,
        endsAtMs: serverNow + 300_000,
      },
    };
    openBoard(start, { serverAheadMs });
    await boardReady();

    // Without the offset this laptop would show 6:30 left.
    await waitFor(() => expect(within(pot(1)).getByTestId('countdown')).toHaveTextContent('5:00'));
    act(() => vi.setSystemTime(laptopNow + 61_000));
    await waitFor(() => expect(within(pot(1)).getByTestId('countdown')).toHaveTextContent('3:59'));
  });

  it('shows how many phones follow, from live:viewers', async () => {
    const { socket } = openBoard();
    await boardReady();
    const count = screen.getByRole('status', { name: 'Phones following' });
    expect(count).toHaveTextContent('0 phones following');

    await serverSays(socket, 'live:viewers', { sessionId, count: 37 });
    expect(count).toHaveTextContent('37 phones following');
    await serverSays(socket, 'live:viewers', { sessionId: 'another-session', count: 2 });
    expect(count).toHaveTextContent('37 phones following');
    await serverSays(socket, 'live:viewers', { sessionId, count: 1 });
    expect(count).toHaveTextContent('1 phone following');
  });

  it('sets the stream delay in seconds and sends it in milliseconds', async () => {
    const { user, socket } = openBoard();
    await boardReady();
    const delay = screen.getByRole('form', { name: 'Stream delay' });
    const field = within(delay).getByLabelText(/Delay in seconds/);

    await user.clear(field);
    await user.type(field, '200');
    expect(within(delay).getByRole('alert')).toHaveTextContent('Use whole seconds from 0 to 120.');
    expect(within(delay).getByRole('button', { name: 'Set delay' })).toBeDisabled();

    await user.clear(field);
    await user.type(field, '15');
    await user.click(within(delay).getByRole('button', { name: 'Set delay' }));
    expect(socket.actions()).toEqual([{ type: 'delay:set', streamDelayMs: 15_000 }]);
    expect(await within(delay).findByText('Now: 15 s')).toBeInTheDocument();
  });

  it('pushes a pot’s amount as a note to every phone', async () => {
    const start = initialState();
    start.pots[0] = { ...start.pots[0]!, stepIndex: 2 };
    const { user, socket } = openBoard(start);
    await boardReady();
    const note = screen.getByRole('form', { name: 'Note to every phone' });

    await user.click(within(note).getByRole('button', { name: 'Pot 1 amount' }));
    expect((within(note).getByLabelText('Note') as HTMLTextAreaElement).value).toMatch(
      /^Low tide: Rockpool teal, 50 mL of stock \(0.5 g dye\) = .+ for a 100 g skein\./,
    );
    await user.click(within(note).getByRole('button', { name: 'Send to every phone' }));

    const [sent] = socket.actions() as [{ type: string; text: string }];
    expect(sent.type).toBe('note:push');
    expect(sent.text).toMatch(/^Low tide: Rockpool teal, 50 mL of stock/);
    expect(await within(note).findByRole('listitem')).toHaveTextContent(sent.text);
    expect(within(note).getByLabelText('Note')).toHaveValue('');
  });

  it('rejoins after a drop, takes the snapshot and ignores older pushes', async () => {
    const { server, socket } = openBoard();
    await boardReady();

    act(() => socket.drop());
    expect(screen.getByRole('alert')).toHaveTextContent(/Offline — reconnecting/);

    // While away, the pot moved on twice (another tab of the host's, say).
    const moved = initialState();
    moved.pots[0] = {
      ...moved.pots[0]!,
      stepIndex: 2,
      timer: { state: 'idle', durationMs: 600_000 },
    };
    server.state = { ...moved, revision: 2 };
    act(() => socket.connect());
    expect(await within(pot(1)).findByText('Pour in the teal stock.')).toBeInTheDocument();
    expect(screen.queryByText(/Offline — reconnecting/)).not.toBeInTheDocument();

    // A push that left the server before the snapshot is older news.
    await serverSays(socket, 'live:state', { ...initialState(), revision: 1 });
    expect(within(pot(1)).getByText('Pour in the teal stock.')).toBeInTheDocument();
    await serverSays(socket, 'live:state', { ...initialState(), revision: 3 });
    expect(within(pot(1)).getByText('Presoak the yarn in lukewarm water.')).toBeInTheDocument();
  });

  it('marks a rehearsal and ends it only after a second, deliberate press', async () => {
    const { user, socket } = openBoard(initialState('rehearsal'));
    await boardReady();
    expect(screen.getByText(/REHEARSAL — only you can see this/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'End the rehearsal…' }));
    const confirm = screen.getByRole('group', { name: 'End the rehearsal?' });
    expect(confirm).toHaveTextContent('It will be discarded');
    expect(within(confirm).getByRole('button', { name: 'Keep going' })).toHaveFocus();
    expect(socket.actions()).toEqual([]);

    await user.click(within(confirm).getByRole('button', { name: 'Yes, end the rehearsal' }));
    expect(socket.actions()).toEqual([{ type: 'session:end' }]);
    expect(await screen.findByRole('heading', { name: 'Rehearsal over' })).toBeInTheDocument();
  });

  it('offers the follow-along link with a QR code', async () => {
    openBoard();
    await boardReady();
    const link = screen.getByRole('region', { name: 'Follow-along link' });
    expect(
      within(link).getByText(`${window.location.origin}/live/${sessionId}`),
    ).toBeInTheDocument();
    expect(
      within(link).getByRole('img', { name: 'QR code of the follow-along link' }),
    ).toBeInTheDocument();
  });
});
