import { shortcutList } from '../utils/keys.ts';

/** The board's keys, always on screen: nobody reads a help page with dye on their gloves. */
export function ShortcutList() {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
      {shortcutList.map((shortcut) => (
        <div key={shortcut.keys} className="contents">
          <dt>
            <kbd className="rounded-md border-2 border-vat-800 bg-white px-2 font-sans font-bold">
              {shortcut.keys}
            </kbd>
          </dt>
          <dd>{shortcut.does}</dd>
        </div>
      ))}
    </dl>
  );
}
