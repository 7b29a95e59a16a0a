import { screen, within } from '@testing-library/react';
import type { Invitation, Member } from '@vatside/contracts/members';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  hostMe,
  kelpwhistleDetail,
  members,
  moderatorMe,
  waitingInvitation,
} from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

const studioApi = '/api/studios/kelpwhistle-dyeworks';
const page = '/studios/kelpwhistle-dyeworks/members';

/** The member names in table order. */
async function namesInTable() {
  const table = await screen.findByRole('table');
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[0]?.textContent);
}

function asHost() {
  signIn(hostMe);
  let invitations: Invitation[] = [waitingInvitation];
  server.use(
    http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('host'))),
    http.get(`${studioApi}/members`, () => HttpResponse.json({ members })),
    http.get(`${studioApi}/invitations`, () => HttpResponse.json({ invitations })),
  );
  return {
    addInvitation: (invitation: Invitation) => (invitations = [...invitations, invitation]),
  };
}

describe('Members, for a host', () => {
  let host: ReturnType<typeof asHost>;
  beforeEach(() => {
    host = asHost();
  });

  it('shows who is where in the header', async () => {
    renderApp(page);
    expect(
      await within(await screen.findByRole('banner')).findByRole('link', {
        name: 'Marin Doe · host of Kelpwhistle Dyeworks',
      }),
    ).toBeVisible();
  });

  it('sorts by a column and filters by text and by role', async () => {
    const { user } = renderApp(page);

    expect(await namesInTable()).toEqual([
      'Ada Quill',
      'Marin Doe',
      'Oskar Fenn',
      'Tove Brackwater',
    ]);

    await user.click(screen.getByRole('button', { name: 'Name' }));
    expect(await namesInTable()).toEqual([
      'Tove Brackwater',
      'Oskar Fenn',
      'Marin Doe',
      'Ada Quill',
    ]);
    expect(screen.getByRole('columnheader', { name: /Name/ })).toHaveAttribute(
      'aria-sort',
      'descending',
    );

    await user.click(screen.getByRole('button', { name: 'Joined' }));
    expect(await namesInTable()).toEqual([
      'Tove Brackwater',
      'Marin Doe',
      'Oskar Fenn',
      'Ada Quill',
    ]);

    await user.type(screen.getByLabelText('Find a member'), 'QUILL');
    expect(await namesInTable()).toEqual(['Ada Quill']);
    expect(screen.getByText('Showing 1 of 4 members')).toBeInTheDocument();

    await user.clear(screen.getByLabelText('Find a member'));
    await user.selectOptions(screen.getByLabelText('Show'), 'viewer');
    expect(await namesInTable()).toEqual(['Tove Brackwater', 'Ada Quill']);
  });

  it('changes a member’s role', async () => {
    let sent: unknown;
    server.use(
      http.patch(`${studioApi}/members/u-ada`, async ({ request }) => {
        sent = await request.json();
        const changed: Member[] = members.map((m) =>
          m.userId === 'u-ada' ? { ...m, role: 'moderator' } : m,
        );
        return HttpResponse.json({ members: changed });
      }),
    );
    const { user } = renderApp(page);

    const select = await screen.findByRole('combobox', { name: 'Role of Ada Quill' });
    await user.selectOptions(select, 'moderator');

    expect(sent).toEqual({ role: 'moderator' });
    await screen.findByRole('combobox', { name: 'Role of Ada Quill' });
    expect(screen.getByRole('combobox', { name: 'Role of Ada Quill' })).toHaveValue('moderator');
  });

  it('shows why the server refuses a role change', async () => {
    server.use(
      http.patch(`${studioApi}/members/u-marin`, () =>
        HttpResponse.json(
          { error: { code: 'CONFLICT', message: 'A studio always keeps a host.' } },
          { status: 409 },
        ),
      ),
    );
    const { user } = renderApp(page);
    await user.selectOptions(
      await screen.findByRole('combobox', { name: 'Role of Marin Doe' }),
      'viewer',
    );

    expect(await screen.findByRole('alert')).toHaveTextContent('A studio always keeps a host.');
    expect(screen.getByRole('combobox', { name: 'Role of Marin Doe' })).toHaveValue('host');
  });

  it('removes a member after a second press', async () => {
    let removed = false;
    server.use(
      http.delete(`${studioApi}/members/u-tove`, () => {
        removed = true;
        return HttpResponse.json({ members: members.filter((m) => m.userId !== 'u-tove') });
      }),
    );
    const { user } = renderApp(page);

    await user.click(await screen.findByRole('button', { name: 'Remove Tove Brackwater' }));
    expect(removed).toBe(false);
    const ask = screen.getByRole('group', { name: 'Remove Tove Brackwater?' });
    expect(within(ask).getByRole('button', { name: 'Keep' })).toHaveFocus();
    await user.click(within(ask).getByRole('button', { name: 'Yes, remove' }));

    expect(removed).toBe(true);
    await screen.findByText('Showing 3 of 3 members');
    expect(await namesInTable()).not.toContain('Tove Brackwater');
  });

  it('invites a moderator by e-mail and lists the invitation', async () => {
    let sent: unknown;
    server.use(
      http.post(`${studioApi}/invitations`, async ({ request }) => {
        sent = await request.json();
        const created: Invitation = {
          ...waitingInvitation,
          id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
          email: 'wren@example.test',
        };
        host.addInvitation(created);
        return HttpResponse.json(created, { status: 201 });
      }),
    );
    const { user } = renderApp(page);

    const panel = await screen.findByRole('region', { name: 'Invite a moderator' });
    const list = await within(panel).findByRole('list', { name: 'Invitations sent' });
    expect(within(list).getByText('lune@example.test')).toBeInTheDocument();

    await user.type(within(panel).getByLabelText(/Moderator’s e-mail/), ' Wren@Example.test ');
    await user.click(within(panel).getByRole('button', { name: 'Send invitation' }));

    expect(await within(panel).findByText('Invitation sent to wren@example.test.')).toBeVisible();
    expect(sent).toEqual({ email: 'wren@example.test' });
    expect(await within(list).findByText('wren@example.test')).toBeInTheDocument();
  });
});

describe('Members, for a moderator', () => {
  it('shows the table without role or removal controls, and no invitations', async () => {
    signIn(moderatorMe);
    server.use(
      http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('moderator'))),
      http.get(`${studioApi}/members`, () => HttpResponse.json({ members })),
    );
    renderApp(page);

    expect(await namesInTable()).toHaveLength(4);
    const table = screen.getByRole('table');
    expect(within(table).queryByRole('combobox')).not.toBeInTheDocument();
    expect(within(table).queryByRole('button', { name: /Remove/ })).not.toBeInTheDocument();
    expect(within(table).getAllByText('Viewer')).toHaveLength(2);
    expect(screen.queryByRole('region', { name: 'Invite a moderator' })).not.toBeInTheDocument();
    expect(
      within(screen.getByRole('banner')).getByRole('link', {
        name: 'Oskar Fenn · moderator of Kelpwhistle Dyeworks',
      }),
    ).toBeVisible();
  });
});
