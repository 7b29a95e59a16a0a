import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { hostMe } from '../../testing/fixtures.ts';
import { firstRender, renderApp } from '../../testing/render-app.tsx';
import { signIn } from '../../testing/server.ts';
import { workbenchAsHost } from '../../testing/workbench-fixtures.ts';

describe('Calculators', { timeout: 30_000 }, () => {
  it('works out 200 mL of a 1 % stock for 100 g at 2 % depth of shade (common practice)', async () => {
    signIn(hostMe);
    workbenchAsHost();
    const { user } = renderApp('/studios/kelpwhistle-dyeworks/calculators');

    const panel = await screen.findByRole('region', { name: 'Dye from stock' }, firstRender);
    const weight = screen.getAllByLabelText('Dry fiber weight')[0]!;
    await user.clear(weight);
    await user.type(weight, '100');
    await user.clear(screen.getByLabelText('Stock strength', { exact: false }));
    await user.type(screen.getByLabelText('Stock strength', { exact: false }), '1');
    await user.clear(screen.getByLabelText('Depth of shade'));
    await user.type(screen.getByLabelText('Depth of shade'), '2');

    expect(panel).toHaveTextContent('Measure 200 mL of stock');
    expect(panel).toHaveTextContent('holding 2 g of dye');

    await user.selectOptions(screen.getByLabelText('I know'), 'stock');
    await user.clear(screen.getByLabelText('Stock used'));
    await user.type(screen.getByLabelText('Stock used'), '50');
    expect(panel).toHaveTextContent('That is 0.5 % depth of shade (0.5 g of dye)');
  });
});
