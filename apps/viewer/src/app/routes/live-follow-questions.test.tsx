import { act, screen, within } from '@testing-library/react';
import type { Question, QuestionQueue } from '@vatside/contracts/questions';
import { http, HttpResponse } from 'msw';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeServer } from '../../testing/fake-socket.ts';
import { adaMe } from '../../testing/fixtures.ts';
import { liveState, program, sessionId } from '../../testing/live-fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

vi.mock('socket.io-client', async () => ({
  io: (await import('../../testing/fake-socket.ts')).fakeIo,
}));

const livePath = `/live/${sessionId}`;

const question = (more: Partial<Question>): Question => ({
  id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
  sessionId,
  text: 'Can I use a slow cooker instead?',
  askerName: 'Wren',
  askedAt: '2025-05-10T17:02:00.000Z',
  meTooCount: 0,
  answeredAt: null,
  answer: '',
  hidden: false,
  askerMuted: false,
  ...more,
});

const queue = (more: Partial<QuestionQueue> = {}): QuestionQueue => ({
  sessionId,
  view: 'viewer',
  questions: [],
  mine: [],
  meToos: [],
  muted: false,
  limits: { minIntervalS: 30, perSession: 5, asked: 0 },
  ...more,
});

const questions = () => screen.findByRole('region', { name: 'Questions' });

beforeAll(() => import('./live-follow.tsx'), 30_000);

beforeEach(() => {
  localStorage.clear();
  fakeServer.reset();
  fakeServer.state = liveState();
  server.use(http.get(`/api/live-sessions/${sessionId}/program`, () => HttpResponse.json(program)));
});

describe('Follow-along questions', () => {
  it('sends a signed-in viewer’s question with questions:ask and lists it', async () => {
    signIn(adaMe);
    fakeServer.answers['questions:join'] = () => queue();
    fakeServer.answers['questions:ask'] = (payload) => ({
      question: question({
        id: '1b2c3d4e-5f6a-4b7c-8d9e-0f1a2b3c4d5e',
        text: (payload as { text: string }).text,
        askerName: 'Ada',
      }),
    });
    const { user } = renderApp(livePath);
    const section = await questions();

    await user.type(
      await within(section).findByLabelText('Your question to the host'),
      '  How long should the yarn cool?  ',
    );
    await user.click(within(section).getByRole('button', { name: 'Send question' }));

    expect(await within(section).findByText('How long should the yarn cool?')).toBeVisible();
    expect(within(section).getByText(/^You asked/)).toBeVisible();
    expect(fakeServer.socket.sent('questions:ask')).toEqual([
      { sessionId, text: 'How long should the yarn cool?' },
    ]);
    expect(within(section).getByLabelText('Your question to the host')).toHaveValue('');
  });

  it('adds “me too” once and shows a kind word when the server asks to wait', async () => {
    signIn(adaMe);
    const asked = question({});
    fakeServer.answers['questions:join'] = () => queue({ questions: [asked] });
    fakeServer.answers['questions:meToo'] = () => ({
      question: { ...asked, meTooCount: 1 },
    });
    fakeServer.answers['questions:ask'] = () => ({
      error: { code: 'RATE_LIMITED', message: 'One question at a time: ask again in 20 s.' },
    });
    const { user } = renderApp(livePath);
    const section = await questions();

    await user.click(await within(section).findByRole('button', { name: `Me too: ${asked.text}` }));
    expect(await within(section).findByText('✓ Me too added')).toBeVisible();
    expect(within(section).getByRole('button', { name: 'You added “me too”' })).toBeDisabled();
    expect(within(section).getByText(/1 “me too”/)).toBeVisible();

    await user.type(within(section).getByLabelText('Your question to the host'), 'And wool?');
    await user.click(within(section).getByRole('button', { name: 'Send question' }));
    expect(await within(section).findByRole('alert')).toHaveTextContent(
      'Thanks! One question at a time: ask again in 20 s.',
    );
    expect(within(section).getByLabelText('Your question to the host')).toHaveValue('And wool?');
  });

  it('shows visitors the answers and a way to sign in, and takes answers as they come', async () => {
    fakeServer.answers['questions:join'] = () =>
      queue({
        view: 'visitor',
        questions: [question({ answeredAt: '2025-05-10T17:05:00.000Z', answer: 'Yes, on low.' })],
      });
    renderApp(livePath);
    const section = await questions();

    expect(await within(section).findByText('Yes, on low.')).toBeVisible();
    expect(within(section).getByRole('link', { name: 'Sign in to ask' })).toHaveAttribute(
      'href',
      `/sign-in?next=${encodeURIComponent(livePath)}`,
    );
    expect(within(section).queryByLabelText('Your question to the host')).not.toBeInTheDocument();
    expect(within(section).queryByRole('button', { name: /Me too/ })).not.toBeInTheDocument();

    await act(async () => {
      fakeServer.socket.fire(
        'questions:changed',
        question({
          id: '2b3c4d5e-6f7a-4b8c-9d0e-1f2a3b4c5d6e',
          text: 'Does citric acid work?',
          answeredAt: '2025-05-10T17:06:00.000Z',
          answer: 'It does.',
        }),
      );
      await new Promise((resolve) => setTimeout(resolve, 20));
    });
    expect(within(section).getByText('It does.')).toBeVisible();
  });
});
