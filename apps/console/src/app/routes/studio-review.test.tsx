import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { auditEntries, reviewPage, reviewQueueServer } from '../../testing/review-fixtures.ts';
import { server } from '../../testing/server.ts';
import { studioApi } from '../../testing/workbench-fixtures.ts';

const card = (name: string) => screen.getByRole('article', { name: `Skein by ${name}` });
const makers = () =>
  within(screen.getByRole('list', { name: 'Shared skeins' }))
    .getAllByRole('article')
    .map((a) => a.getAttribute('aria-label'));

describe('The review queue, by keyboard', () => {
  let api: ReturnType<typeof reviewQueueServer>;
  beforeEach(() => {
    api = reviewQueueServer();
  });

  it('moves with j/k and the arrows, focus following; a approves and the next takes its place', async () => {
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    expect(makers()).toEqual([
      'Skein by Wren Alder',
      'Skein by Juniper Sloe',
      'Skein by Corra Vane',
    ]);
    expect(screen.getByRole('link', { name: /^Review/ })).toHaveTextContent('Review3 waiting');

    await user.keyboard('j');
    expect(card('Juniper Sloe')).toHaveFocus();
    expect(card('Juniper Sloe')).toHaveAttribute('aria-current', 'true');
    await user.keyboard('{ArrowDown}');
    expect(card('Corra Vane')).toHaveFocus();
    await user.keyboard('k');
    await user.keyboard('{ArrowUp}');
    expect(card('Wren Alder')).toHaveFocus();
    await user.keyboard('{ArrowUp}'); // stays on the first
    expect(card('Wren Alder')).toHaveFocus();

    await user.keyboard('j');
    await user.keyboard('a');
    expect(await screen.findByText('Approved: Juniper Sloe’s skein.')).toBeVisible();
    expect(api.decisions).toEqual([{ submissionId: api.skeins[1]!.id, decision: 'approve' }]);
    expect(makers()).toEqual(['Skein by Wren Alder', 'Skein by Corra Vane']);
    await waitFor(() => expect(card('Corra Vane')).toHaveFocus());
  });

  it('c asks for a reason: a number picks a template, Enter sends it; Esc cancels', async () => {
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    await user.keyboard('r');
    const declining = screen.getByRole('dialog', { name: /Decline: Wren Alder’s skein/ });
    await user.keyboard('{Escape}');
    expect(declining).not.toBeInTheDocument();
    expect(card('Wren Alder')).toHaveFocus();
    expect(api.decisions).toEqual([]);

    await user.keyboard('c');
    const dialog = screen.getByRole('dialog', { name: /Ask for a change: Wren Alder’s skein/ });
    await user.keyboard('3');
    expect(within(dialog).getByRole('radio', { name: /Photo blurry/ })).toBeChecked();
    // Focus stays inside the dialog: back from the chosen reason wraps round to Cancel.
    await user.keyboard('{Shift>}{Tab}{/Shift}');
    expect(within(dialog).getByRole('button', { name: 'Cancel' })).toHaveFocus();
    await user.keyboard('{Tab}');
    expect(within(dialog).getByRole('radio', { name: /Photo blurry/ })).toHaveFocus();
    await user.keyboard('{Enter}');
    await screen.findByText('Asked for a change: Wren Alder’s skein.');
    expect(api.decisions).toEqual([
      { submissionId: api.skeins[0]!.id, decision: 'needsChanges', reasonTemplate: 'blurry' },
    ]);
  });

  it('a typed reason is sent as written', async () => {
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    await user.keyboard('r');
    const dialog = screen.getByRole('dialog');
    await user.click(within(dialog).getByRole('radio', { name: 'In my own words' }));
    await user.type(within(dialog).getByLabelText('Your reason to the maker'), 'Not yarn at all.');
    await user.click(within(dialog).getByRole('button', { name: 'Decline' }));
    await screen.findByText('Declined: Wren Alder’s skein.');
    expect(api.decisions).toEqual([
      { submissionId: api.skeins[0]!.id, decision: 'reject', reason: 'Not yarn at all.' },
    ]);
  });

  it('f features only with the maker’s consent and says why otherwise', async () => {
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    expect(within(card('Wren Alder')).getByRole('button', { name: 'Feature' })).toBeDisabled();
    await user.keyboard('f');
    expect(
      within(screen.getByRole('alert')).getByText(/Wren Alder has not agreed to be featured/),
    ).toBeVisible();
    expect(api.decisions).toEqual([]);
    await user.keyboard('j');
    await user.keyboard('f');
    await screen.findByText('Featured: Juniper Sloe’s skein.');
    expect(api.decisions).toEqual([{ submissionId: api.skeins[1]!.id, decision: 'feature' }]);
  });

  it('a refused decision puts the skein back and shows the server’s words', async () => {
    api.refuse.set(api.skeins[0]!.id, 'It is already approved.');
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    await user.keyboard('a');
    expect(
      await within(await screen.findByRole('alert')).findByText(
        'Wren Alder’s skein: It is already approved.',
      ),
    ).toBeVisible();
    expect(makers()).toContain('Skein by Wren Alder');
  });
});

describe('Bulk decisions on a selection', () => {
  let api: ReturnType<typeof reviewQueueServer>;
  beforeEach(() => {
    api = reviewQueueServer();
  });

  it('x selects; Shift+A approves the selection; a refusal is named, the rest go through', async () => {
    api.refuse.set(api.skeins[2]!.id, 'It is already declined.');
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    await user.keyboard('{Shift>}A{/Shift}');
    expect(screen.getByText('Select skeins first (X, or their Select box).')).toBeVisible();

    await user.keyboard('x');
    await user.keyboard('jj');
    await user.keyboard('x');
    expect(screen.getByText('2 selected')).toBeVisible();
    await user.keyboard('j'); // the last skein; k comes back to the middle one
    await user.keyboard('k');
    await user.keyboard('x');
    await user.keyboard('x'); // twice: unselected again
    expect(
      within(card('Juniper Sloe')).getByRole('checkbox', { name: 'Select' }),
    ).not.toBeChecked();

    await user.keyboard('{Shift>}A{/Shift}');
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Approved: 1 of 2 skeins.');
    expect(alert).toHaveTextContent('Corra Vane’s skein: It is already declined.');
    expect(api.bulks).toEqual([
      { submissionIds: [api.skeins[0]!.id, api.skeins[2]!.id], decision: 'approve' },
    ]);
    await waitFor(() => expect(makers()).toEqual(['Skein by Juniper Sloe', 'Skein by Corra Vane']));
    expect(screen.getByText('1 selected')).toBeVisible(); // the refused one stays selected
  });

  it('by mouse: Select all shown, then Decline selected with a template reason', async () => {
    const { user } = renderApp(reviewPage);
    await screen.findByRole('article', { name: 'Skein by Wren Alder' }, firstRender);
    await user.click(screen.getByRole('button', { name: 'Select all shown' }));
    await user.click(screen.getByRole('button', { name: 'Decline selected' }));
    const dialog = screen.getByRole('dialog', { name: 'Decline: 3 selected skeins' });
    await user.click(
      within(dialog).getByRole('radio', { name: /Not a skein from this dye-along/ }),
    );
    await user.click(within(dialog).getByRole('button', { name: 'Decline' }));
    await screen.findByText('Declined: 3 of 3 skeins.');
    expect(api.bulks).toEqual([
      { submissionIds: api.skeins.map((s) => s.id), decision: 'reject', reasonTemplate: 'notYarn' },
    ]);
    expect(await screen.findByText(/Nothing waits for review/)).toBeVisible();
  });
});

describe('The review audit', () => {
  it('lists each decision with who, when, the skein, the change and the reason', async () => {
    reviewQueueServer();
    server.use(
      http.get(`${studioApi}/review/audit`, () =>
        HttpResponse.json({ items: auditEntries, page: { limit: 25, offset: 0, total: 2 } }),
      ),
    );
    renderApp(`${reviewPage}/audit`);
    const table = await screen.findByRole('table', {}, firstRender);
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows[0]).toHaveTextContent('Oskar Fenn');
    expect(rows[0]).toHaveTextContent('Asked for a change');
    expect(rows[0]).toHaveTextContent('Waiting → Sent back for a change');
    expect(rows[0]).toHaveTextContent('The photo is a little blurry.');
    // The skein by its base and maker, not only by an id.
    expect(rows[0]).toHaveTextContent('Harbor DK by Ada Wren');
    expect(rows[1]).toHaveTextContent('A removed account');
    expect(rows[1]).toHaveTextContent('A withdrawn skein');
    expect(rows[1]).toHaveTextContent('Waiting → In the gallery');
  });
});
