import { fireEvent, screen, within } from '@testing-library/react';
import type { RecapUpdate } from '@vatside/contracts/gallery';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { hostMe, kelpwhistleDetail } from '../../testing/fixtures.ts';
import { dyeAlongId, recapApi, threeItemRecap, spareSkein } from '../../testing/recap-fixtures.ts';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import { studioApi } from '../../testing/workbench-fixtures.ts';

const base = `/studios/kelpwhistle-dyeworks/dye-alongs/${dyeAlongId}`;

function asHost() {
  signIn(hostMe);
  server.use(
    http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('host'))),
    http.get(recapApi, () => HttpResponse.json(threeItemRecap)),
    // The presenter holds every photo as a blob before recording.
    http.get(`${studioApi}/submissions/:id/photos/:photo/web`, () =>
      HttpResponse.arrayBuffer(new Uint8Array([0xff, 0xd8, 0xff, 0xd9]).buffer, {
        headers: { 'content-type': 'image/jpeg' },
      }),
    ),
  );
}

describe('Recap presenter', { timeout: 30_000 }, () => {
  beforeEach(() => {
    // jsdom has no object URLs; the presenter only needs distinct strings back.
    let n = 0;
    vi.stubGlobal(
      'URL',
      Object.assign(URL, {
        createObjectURL: () => `blob:held-${++n}`,
        revokeObjectURL: () => undefined,
      }),
    );
  });
  afterEach(() => vi.unstubAllGlobals());

  it('steps through the items with the keys a clicker sends, and holds photos offline', async () => {
    asHost();
    renderApp(`${base}/presenter`);
    const progress = await screen.findByRole('status', { name: 'Item 1 of 3' }, firstRender);
    expect(progress).toHaveTextContent('1 / 3');
    const shown = () => screen.getByRole('region', { name: 'Shown now' });
    expect(within(shown()).getByRole('heading', { level: 1 })).toHaveTextContent('Wren Tallow');
    expect(shown()).toHaveTextContent('Harbor DK');
    await screen.findByText('Ready to record offline');
    expect(screen.getByRole('img', { name: 'Pool Teal by Wren Tallow' })).toHaveAttribute(
      'src',
      expect.stringMatching(/^blob:held-/),
    );

    fireEvent.keyDown(window, { key: 'PageDown' });
    expect(screen.getByRole('status', { name: 'Item 2 of 3' })).toHaveTextContent('2 / 3');
    expect(within(shown()).getByRole('heading', { level: 1 })).toHaveTextContent('Pool Teal');
    expect(within(shown()).getByText('Deep pool')).toBeInTheDocument();

    fireEvent.keyDown(window, { key: ' ' });
    expect(within(shown()).getByRole('heading', { level: 1 })).toHaveTextContent('Otto Marsh');
    expect(shown()).toHaveTextContent('Moss gel, Lemon gel');
    // Past the end it stays on the last item.
    fireEvent.keyDown(window, { key: 'ArrowRight' });
    expect(screen.getByRole('status', { name: 'Item 3 of 3' })).toBeInTheDocument();

    fireEvent.keyDown(window, { key: 'PageUp' });
    expect(screen.getByRole('status', { name: 'Item 2 of 3' })).toBeInTheDocument();
    fireEvent.keyDown(window, { key: 'Home' });
    expect(screen.getByRole('status', { name: 'Item 1 of 3' })).toBeInTheDocument();
    fireEvent.keyDown(window, { key: 'End' });
    expect(screen.getByRole('status', { name: 'Item 3 of 3' })).toBeInTheDocument();
    fireEvent.keyDown(window, { key: 'ArrowLeft' });

    // The note shows only when the host asks for it.
    expect(screen.queryByRole('complementary', { name: 'Your note' })).not.toBeInTheDocument();
    fireEvent.keyDown(window, { key: 'n' });
    expect(screen.getByRole('complementary', { name: 'Your note' })).toHaveTextContent(
      'My own skein.',
    );
  });
});

describe('Recap running order', { timeout: 30_000 }, () => {
  it('reorders with the move buttons, adds a featured skein, writes a note, and saves', async () => {
    asHost();
    let sent: RecapUpdate | undefined;
    server.use(
      http.put(recapApi, async ({ request }) => {
        sent = (await request.json()) as RecapUpdate;
        return HttpResponse.json(threeItemRecap);
      }),
    );
    const { user } = renderApp(`${base}/recap`);
    const order = await screen.findByRole('list', { name: 'Recap running order' }, firstRender);
    const names = () =>
      within(order)
        .getAllByRole('listitem')
        .map((li) => li.getAttribute('aria-label'));
    expect(names()).toEqual([
      '1. Pool Teal by Wren Tallow',
      '2. Pool Teal (the studio’s own)',
      '3. Pool Teal by Otto Marsh',
    ]);
    expect(screen.getByText(/whose makers agreed to be featured/)).toBeInTheDocument();
    const save = screen.getByRole('button', { name: 'Save running order' });
    expect(save).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Move item 3 up' }));
    await user.click(screen.getByRole('button', { name: 'Move item 2 up' }));
    expect(names()).toEqual([
      '1. Pool Teal by Otto Marsh',
      '2. Pool Teal by Wren Tallow',
      '3. Pool Teal (the studio’s own)',
    ]);
    await user.click(screen.getByRole('button', { name: 'Add Pool Teal by Ines Shore' }));
    await user.type(screen.getByLabelText(/^Note for item 4/), 'Look at the speckles.');
    await user.click(screen.getByRole('button', { name: 'Take out item 3 from the recap' }));
    expect(screen.getByText('Not saved yet')).toBeInTheDocument();

    await user.click(save);
    await screen.findByText('Running order saved.');
    expect(sent).toEqual({
      items: [
        {
          submissionId:
            threeItemRecap.items[2]!.kind === 'skein' ? threeItemRecap.items[2]!.skein.id : '',
          note: '',
        },
        {
          submissionId:
            threeItemRecap.items[0]!.kind === 'skein' ? threeItemRecap.items[0]!.skein.id : '',
          note: 'Say hi to Wren.',
        },
        { submissionId: spareSkein.id, note: 'Look at the speckles.' },
      ],
    });
  });
});
