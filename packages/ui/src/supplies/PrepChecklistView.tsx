import type { PrepChecklist, PrepItem } from '@vatside/contracts/dye-along-supplies';
import { cautionWords } from '../StepCaution.tsx';
import type { HeadingLevel } from './SupplyListView.tsx';

const sourceWords = {
  runSheet: 'From the run sheet',
  commonPractice: 'Common practice',
  host: 'From the host',
} as const;

function PrepList({
  title,
  items,
  level,
}: {
  title: string;
  items: PrepItem[];
  level: HeadingLevel;
}) {
  const Heading = level === 3 ? 'h3' : 'h4';
  return (
    <section aria-label={title} className="space-y-2">
      <Heading className="text-xl font-bold">{title}</Heading>
      {items.length === 0 ? (
        <p>Nothing to do yet.</p>
      ) : (
        <ol className="space-y-2">
          {items.map((item, i) => (
            <li key={item.id} className="flex gap-3 rounded-xl border border-wool-200 bg-white p-3">
              <span aria-hidden="true" className="w-6 shrink-0 text-right font-bold text-vat-800">
                {i + 1}.
              </span>
              <span className="min-w-0">
                <span className="block">{item.text}</span>
                <span className="block text-sm text-vat-800">
                  {sourceWords[item.source]}
                  {item.caution ? (
                    <span className="font-bold text-vat-950">
                      {' '}
                      · <span aria-hidden="true">⚠ </span>Caution:{' '}
                      {cautionWords[item.caution].title}
                    </span>
                  ) : null}
                </span>
              </span>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}

/** What to do the day before and the hour before, in order. */
export function PrepChecklistView({
  checklist,
  level = 3,
}: {
  checklist: PrepChecklist;
  level?: HeadingLevel;
}) {
  return (
    <div className="space-y-6">
      <PrepList title="The day before" items={checklist.dayBefore} level={level} />
      <PrepList title="An hour before" items={checklist.hourBefore} level={level} />
    </div>
  );
}
