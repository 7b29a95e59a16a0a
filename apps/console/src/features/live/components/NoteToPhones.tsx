import type { HostAction, LiveNote } from '@vatside/contracts/live';
import { Button } from '@vatside/ui/Button';
import { useId, useState } from 'react';

export const noteMaxChars = 280;

export type AmountShortcut = { potNumber: number; note: string };

/** A short note, or a pot's current amount, on every phone at once. */
export function NoteToPhones({
  amounts,
  recent,
  refusal,
  onSend,
}: {
  amounts: AmountShortcut[];
  /** The latest notes the phones show, newest first. */
  recent: LiveNote[];
  refusal: string | undefined;
  onSend: (action: HostAction) => Promise<boolean>;
}) {
  const fieldId = useId();
  const countId = useId();
  const [text, setText] = useState('');
  const trimmed = text.trim();

  async function push() {
    if (await onSend({ type: 'note:push', text: trimmed })) setText('');
  }

  return (
    <form
      aria-label="Note to every phone"
      className="space-y-3"
      onSubmit={(event) => {
        event.preventDefault();
        if (trimmed) void push();
      }}
    >
      <label htmlFor={fieldId} className="block font-bold">
        Note
      </label>
      <textarea
        id={fieldId}
        value={text}
        maxLength={noteMaxChars}
        rows={3}
        aria-describedby={countId}
        onChange={(event) => setText(event.target.value)}
        className="w-full rounded-xl border-2 border-vat-800 bg-white px-3 py-2 text-lg"
      />
      <p id={countId} className="text-sm text-vat-800">
        {noteMaxChars - text.length} characters left
      </p>
      {amounts.length > 0 ? (
        <div className="flex flex-wrap gap-2">
          {amounts.map((amount) => (
            <Button key={amount.potNumber} variant="secondary" onClick={() => setText(amount.note)}>
              Pot {amount.potNumber} amount
            </Button>
          ))}
        </div>
      ) : (
        <p className="text-vat-800">No pot is on a measuring step right now.</p>
      )}
      {refusal ? (
        <p role="alert" className="font-bold text-madder-800">
          {refusal}
        </p>
      ) : null}
      <Button type="submit" size="hand" disabled={!trimmed}>
        Send to every phone
      </Button>
      {recent.length > 0 ? (
        <div>
          <h3 className="font-bold">On the phones now</h3>
          <ul className="mt-1 space-y-1">
            {recent.map((note) => (
              <li key={note.id} className="rounded-lg bg-wool-100 px-3 py-1">
                {note.text}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </form>
  );
}
