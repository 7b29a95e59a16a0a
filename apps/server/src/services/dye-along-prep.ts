import type { PrepChecklist, PrepItem, SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { StoredPrepItem } from '@vatside/db/schema';
import type { SupplyColorway } from './dye-along-supplies.ts';

// The prep checklist: what to do the day before and an hour before, derived from the run sheets
// and the supply list, plus fixed common-practice items and the host's own. Pure.

const SOAK_WORDS = /\b(pre-?soak|soak)/i;
/** A soak this long is started the evening before (common practice: overnight is fine). */
const OVERNIGHT_SOAK_S = 3 * 3600;
/** Common practice: at least half an hour so the fiber wets through and takes dye evenly. */
const SHORTEST_SOAK_MIN = 30;

/** "A syringe marked in mL" → "a syringe marked in mL" (the unit keeps its case). */
const lowerFirst = (t: string) => t.charAt(0).toLowerCase() + t.slice(1);
const fmt = (n: number) => String(Number(n.toPrecision(3)));

function acidWords(a: SupplyList['acid'][number]): string {
  return a.acid === 'vinegar'
    ? `vinegar (${fmt(a.acidStrengthPct ?? 5)} % acetic acid)`
    : 'citric acid crystals';
}

export function prepChecklist(
  colorways: SupplyColorway[],
  supplies: SupplyList,
  hostItems: StoredPrepItem[],
): PrepChecklist {
  const dayBefore: PrepItem[] = [];
  const hourBefore: PrepItem[] = [];
  const add = (
    list: PrepItem[],
    id: string,
    text: string,
    source: PrepItem['source'],
    caution: PrepItem['caution'] = null,
  ) =>
    list.push({ id, text, when: list === dayBefore ? 'dayBefore' : 'hourBefore', source, caution });

  add(
    dayBefore,
    'check-supplies',
    'Check that everything on the supply list is in the house: yarn, dyes, acid, gloves and pots.',
    'commonPractice',
  );
  add(
    dayBefore,
    'tie-skeins',
    'Tie each skein loosely in figure-eights in three or four places, so dye reaches every strand and the skein does not tangle.',
    'commonPractice',
  );

  const powder =
    supplies.dyes.some((d) => d.fromPowder) ||
    colorways.some((c) => c.steps.some((s) => s.caution === 'powder'));
  if (powder) {
    add(
      dayBefore,
      'dust-mask',
      'Set out a dust mask and gloves for mixing dye powders; mix away from food and open windows.',
      'runSheet',
      'powder',
    );
  }
  for (const dye of supplies.dyes) {
    if (dye.kind !== 'stock' || !dye.mix) continue;
    const powderWords = dye.fromPowder
      ? `dissolve ${fmt(dye.mix.powderG)} g of powder in a little hot water, then top up to ${fmt(dye.mix.volumeMl)} mL`
      : `make ${fmt(dye.mix.volumeMl)} mL`;
    add(
      dayBefore,
      `mix:${dye.key}`,
      `Mix ${dye.name} stock at ${fmt(dye.stockStrengthPct ?? 0)} %: ${powderWords}, and label the jar (you need ${fmt(dye.volumeMl ?? 0)} mL).`,
      'runSheet',
      dye.fromPowder ? 'powder' : null,
    );
  }

  // Soak steps: the longest soak decides when to start.
  const soaking = colorways.flatMap((c) =>
    c.steps
      .filter((s) => SOAK_WORDS.test(s.instruction))
      .map((s) => ({ colorway: c.name, step: s })),
  );
  if (soaking.length > 0) {
    const longestS = Math.max(...soaking.map((s) => s.step.timerSeconds ?? 0));
    const names = [...new Set(soaking.map((s) => s.colorway))].join(', ');
    if (longestS >= OVERNIGHT_SOAK_S) {
      add(
        dayBefore,
        'soak-yarn',
        `Put the yarn to soak overnight in lukewarm water with a drop of wool wash or dish soap (${names}).`,
        'runSheet',
      );
    } else {
      const minutes = Math.max(SHORTEST_SOAK_MIN, Math.round(longestS / 60));
      add(
        hourBefore,
        'soak-yarn',
        `Soak the yarn in lukewarm water with a drop of wool wash or dish soap for at least ${minutes} minutes (${names}).`,
        'runSheet',
      );
    }
  }

  add(
    hourBefore,
    'clear-stove',
    'Clear the stove and the counter around it, turn pot handles inward, and keep children and pets out of the kitchen.',
    'commonPractice',
    'hotBath',
  );
  add(
    hourBefore,
    'cover-counter',
    'Cover the counter with newspaper or an old towel: dye stains.',
    'commonPractice',
  );
  add(
    hourBefore,
    'set-out-equipment',
    `Set out the equipment: ${supplies.equipment.map((e) => lowerFirst(e.item.replace(/^Pot: /, ''))).join(', ')}.`,
    'commonPractice',
  );
  for (const acid of supplies.acid) {
    add(
      hourBefore,
      `acid:${acid.acid}:${acid.acidStrengthPct ?? ''}`,
      `Measure out ${acid.household.label} (${fmt(acid.amountMl)} mL) of ${acidWords(acid)}${acid.acid === 'citric' ? ' and dissolve it in a cup of hot water' : ''}.`,
      'runSheet',
      'acid',
    );
  }
  const foodColors = supplies.dyes.filter((d) => d.kind === 'foodColor').map((d) => d.name);
  if (foodColors.length > 0) {
    add(
      hourBefore,
      'food-colors',
      `Set out the food colors: ${foodColors.join(', ')}.`,
      'runSheet',
    );
  }

  for (const item of hostItems) {
    add(item.when === 'dayBefore' ? dayBefore : hourBefore, `host:${item.id}`, item.text, 'host');
  }
  return { dayBefore, hourBefore };
}
