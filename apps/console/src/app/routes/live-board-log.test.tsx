import { screen, within } from '@testing-library/react';
import type { DyeLogEntry, SessionDyeLog } from '@vatside/contracts/dye-log';
import type { Question } from '@vatside/contracts/questions';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import {
  boardAsHost,
  boardPath,
  emptyDyeLog,
  fakeLiveServer,
  initialState,
  program,
  sessionId,
  tealLineId,
} from '../../testing/live-fixtures.ts';
import { server } from '../../testing/server.ts';
import type * as SocketModule from '../../features/live/socket.ts';
import { renderApp } from '../../testing/render-app.tsx';

const opened = vi.hoisted(() => ({ socket: undefined as unknown }));
vi.mock('../../features/live/socket.ts', async (importOriginal) => ({
  ...(await importOriginal<typeof SocketModule>()),
  openHostSocket: () => opened.socket,
}));

const lowTide = program.pots[0]!;

/** The host's board with a fake server that logs what it is sent into the REST dye log. */
function openBoard() {
  boardAsHost();
  const live = fakeLiveServer(initialState());
  let log: SessionDyeLog = emptyDyeLog;
  live.socket.answer('dyeLog:record', (payload: { amount?: number }) => {
    const amount = payload.amount ?? 50;
    const entry: DyeLogEntry = {
      id: 'e0000000-0000-4000-8000-000000000001',
      sessionId,
      potId: lowTide.potId,
      recipeLineId: tealLineId,
      kind: 'stock',
      name: 'Rockpool teal',
      amount,
      unit: 'mL',
      plannedAmount: 50,
      asPlanned: payload.amount === undefined,
      stockSolutionId: null,
      jarChangeMl: 0,
      addedAt: new Date().toISOString(),
      note: '',
      supersedesId: null,
      reason: '',
      supersededById: null,
      recordedByName: 'Host',
      recordedAt: new Date().toISOString(),
    };
    log = { ...log, entries: [...log.entries, entry] };
    return { entry, line: log.pots[0]!.lines[0]! };
  });
  server.use(http.get(`/api/live-sessions/${sessionId}/dye-log`, () => HttpResponse.json(log)));
  opened.socket = live.socket;
  const { user } = renderApp(boardPath);
  return { user, socket: live.socket };
}

const dyeLog = () =>
  screen.findByRole('region', { name: 'Dye log · Low tide' }, { timeout: 10_000 });

describe('Pot board dye log', () => {
  it('logs a line as planned with dyeLog:record and no amount', { timeout: 15_000 }, async () => {
    const { user, socket } = openBoard();
    const panel = await dyeLog();
    expect(within(panel).getByText(/planned 50 mL/)).toBeInTheDocument();

    await user.click(within(panel).getByRole('button', { name: 'Log as planned: Rockpool teal' }));

    expect(socket.sent.filter((s) => s.event === 'dyeLog:record').map((s) => s.payload)).toEqual([
      { sessionId, potId: lowTide.potId, recipeLineId: tealLineId },
    ]);
    const entries = await within(panel).findByRole('list', { name: 'Logged for Low tide' });
    expect(within(entries).getByText(/as planned/)).toBeInTheDocument();
  });

  it('sends the adjusted amount when the host adjusts before logging', async () => {
    const { user, socket } = openBoard();
    const panel = await dyeLog();

    await user.click(within(panel).getByRole('button', { name: 'Adjust Rockpool teal' }));
    const field = within(panel).getByLabelText('Amount of Rockpool teal that went in (mL)');
    await user.clear(field);
    await user.type(field, '42.5');
    await user.click(within(panel).getByRole('button', { name: 'Log' }));

    expect(socket.sent.filter((s) => s.event === 'dyeLog:record').map((s) => s.payload)).toEqual([
      { sessionId, potId: lowTide.potId, recipeLineId: tealLineId, amount: 42.5 },
    ]);
    const entries = await within(panel).findByRole('list', { name: 'Logged for Low tide' });
    expect(within(entries).getByText('42.5 mL')).toBeInTheDocument();
    expect(within(entries).getByText(/adjusted/)).toBeInTheDocument();
  });

  it('voids an entry with dyeLog:correct at 0 and a reason', async () => {
    const { user, socket } = openBoard();
    socket.answer('dyeLog:correct', () => ({
      error: { code: 'CONFLICT', message: 'Stop here: the fake keeps no corrections.' },
    }));
    const panel = await dyeLog();
    await user.click(within(panel).getByRole('button', { name: 'Log as planned: Rockpool teal' }));
    const entries = await within(panel).findByRole('list', { name: 'Logged for Low tide' });

    await user.click(within(entries).getByRole('button', { name: /^Correct Rockpool teal/ }));
    const amount = within(entries).getByLabelText('Right amount (mL; 0 voids the entry)');
    await user.clear(amount);
    await user.type(amount, '0');
    await user.type(within(entries).getByLabelText('Why'), 'Spilled on the counter');
    await user.click(within(entries).getByRole('button', { name: 'Save correction' }));

    expect(socket.sent.filter((s) => s.event === 'dyeLog:correct').map((s) => s.payload)).toEqual([
      {
        sessionId,
        entryId: 'e0000000-0000-4000-8000-000000000001',
        amount: 0,
        reason: 'Spilled on the counter',
      },
    ]);
    expect(await within(panel).findByRole('alert')).toHaveTextContent(
      'Stop here: the fake keeps no corrections.',
    );
  });

  it('shows the server’s refusal beside the pot', async () => {
    const { user, socket } = openBoard();
    socket.answer('dyeLog:record', () => ({
      error: { code: 'CONFLICT', message: 'The Rockpool teal jar has only 20 mL left.' },
    }));
    const panel = await dyeLog();
    await user.click(within(panel).getByRole('button', { name: 'Log as planned: Rockpool teal' }));
    expect(await within(panel).findByRole('alert')).toHaveTextContent(
      'The Rockpool teal jar has only 20 mL left.',
    );
  });
});

describe('Pot board questions', () => {
  it('marks a question answered with questions:answer', async () => {
    const { user, socket } = openBoard();
    const asked: Question = {
      id: 'f0000000-0000-4000-8000-000000000001',
      sessionId,
      text: 'Is vinegar enough for this pot?',
      askerName: 'Wren',
      askedAt: '2025-05-10T17:02:00.000Z',
      meTooCount: 2,
      answeredAt: null,
      answer: '',
      hidden: false,
      askerMuted: false,
    };
    socket.answer('questions:join', () => ({
      sessionId,
      view: 'staff',
      questions: [asked],
      mine: [],
      meToos: [],
      muted: false,
      limits: { minIntervalS: 30, perSession: 5, asked: 0 },
    }));
    socket.answer('questions:answer', ({ answer }: { answer: string }) => ({
      question: { ...asked, answer, answeredAt: '2025-05-10T17:04:00.000Z' },
    }));
    await dyeLog();
    const row = await screen.findByRole('listitem', { name: 'Question from Wren' });

    await user.type(within(row).getByLabelText('Short answer (optional)'), 'Yes, 5 % is plenty.');
    await user.click(within(row).getByRole('button', { name: 'Mark answered' }));

    expect(socket.sent.filter((s) => s.event === 'questions:answer').map((s) => s.payload)).toEqual(
      [{ sessionId, questionId: asked.id, answer: 'Yes, 5 % is plenty.' }],
    );
    expect(await within(row).findByText(/Yes, 5 % is plenty\./)).toHaveTextContent(
      'Answered: Yes, 5 % is plenty.',
    );
    expect(within(row).getByRole('button', { name: 'Hide' })).toBeInTheDocument();
    expect(within(row).getByRole('button', { name: 'Mute asker' })).toBeInTheDocument();
  });
});
