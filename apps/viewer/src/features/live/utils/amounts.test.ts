import { describe, expect, it } from 'vitest';
import { program } from '../../../testing/live-fixtures.ts';
import { amountForLine, dropsWithYourDropper, scalePot, stepLineIndex } from './amounts.ts';
import { fallbackKit, type Kit } from '../../../lib/kit.ts';

const [sea, rock] = program.pots as [(typeof program.pots)[0], (typeof program.pots)[0]];
const kit = (changes: Partial<Kit>): Kit => ({ ...fallbackKit, ...changes });

describe('amounts for the viewer’s skein', () => {
  it('scales a stock line by depth of shade: 50 g × 2 % ÷ 1 % stock = 100 mL', () => {
    const scaled = scalePot(sea, kit({ skeinWeightG: 50 }));
    const index = stepLineIndex(sea, sea.steps[1]!);
    expect(index).toBe(0);
    const amount = scaled && index !== null ? amountForLine(scaled, index) : null;
    expect(amount?.line.amount).toBeCloseTo(100, 10);
    expect(amount?.line.measurement.household?.system).toBe('us');
  });

  it('turns the host’s drops into drops of the viewer’s dropper', () => {
    // 10 drops per 100 g × 50 g = 5 host drops = 0.25 mL at the usual 20 drops per mL;
    // a dropper giving 30 drops per mL needs 7.5, so 8.
    const viewer = kit({ skeinWeightG: 50, dropsPerMl: 30 });
    const line = scalePot(rock, viewer)?.lines[0];
    expect(line?.volumeMl).toBeCloseTo(0.25, 10);
    expect(dropsWithYourDropper(line?.volumeMl ?? 0, viewer)).toBe(8);
  });

  it('finds no line for a step that measures nothing', () => {
    expect(stepLineIndex(sea, sea.steps[0]!)).toBeNull();
  });
});
