import { reviewKeyLegend } from '../keys.ts';

/** The queue's keys, always on screen. */
export function KeyLegend() {
  return (
    <section aria-labelledby="review-keys-title" className="space-y-2">
      <h2 id="review-keys-title" className="font-display text-xl font-semibold">
        Keys
      </h2>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1.5 md:grid-cols-[auto_1fr_auto_1fr] lg:grid-cols-[auto_1fr]">
        {reviewKeyLegend.map((shortcut) => (
          <div key={shortcut.keys} className="contents">
            <dt>
              <kbd className="rounded-md border-2 border-vat-800 bg-white px-2 font-sans font-bold whitespace-nowrap">
                {shortcut.keys}
              </kbd>
            </dt>
            <dd>{shortcut.does}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
