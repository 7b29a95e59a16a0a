import type { DyeLogEntry, DyeLogLine, DyeLogPot } from '@vatside/contracts/dye-log';
import { Button } from '@vatside/ui/Button';
import { useId, useState, type FormEvent } from 'react';
import { clockTime, entryStatus, formatAmount, parseAmount, unitName } from '../utils/dye-log.ts';

const inputClass =
  'min-h-16 w-full rounded-xl border-2 border-vat-800 bg-wool-50 px-3 text-xl focus-visible:outline-4 focus-visible:outline-vat-600';

export type DyeLogPanelProps = {
  pot: DyeLogPot;
  /** This pot's entries, oldest first, corrections included. */
  entries: DyeLogEntry[];
  refusal: string | undefined;
  onRecord: (recipeLineId: string, amount?: number) => Promise<boolean>;
  onCorrect: (entryId: string, amount: number, reason: string) => Promise<boolean>;
};

/** What went into one pot: each planned line, one tap to log it as planned, and the history. */
export function DyeLogPanel({ pot, entries, refusal, onRecord, onCorrect }: DyeLogPanelProps) {
  const headingId = useId();
  const lineOf = new Map(pot.lines.map((line) => [line.recipeLineId, line]));
  return (
    <section
      aria-labelledby={headingId}
      className="space-y-3 rounded-card border-2 border-wool-300 bg-wool-100 p-3"
    >
      <h3 id={headingId} className="font-display text-xl font-semibold">
        Dye log · {pot.colorwayName}
      </h3>
      {refusal ? (
        <p
          role="alert"
          className="rounded-xl border-2 border-madder-700 bg-madder-100 px-3 py-2 text-lg font-bold text-madder-800"
        >
          <span aria-hidden="true">✕ </span>
          {refusal}
        </p>
      ) : null}
      {pot.lines.length === 0 ? <p>No dye lines in this pot’s recipe.</p> : null}
      {pot.lines.map((line) => (
        <LineLogger key={line.recipeLineId} line={line} onRecord={onRecord} />
      ))}
      {entries.length > 0 ? (
        <ol aria-label={`Logged for ${pot.colorwayName}`} className="space-y-2">
          {entries.map((entry) => (
            <EntryRow
              key={entry.id}
              entry={entry}
              line={lineOf.get(entry.recipeLineId)}
              onCorrect={onCorrect}
            />
          ))}
        </ol>
      ) : (
        <p className="text-vat-800">Nothing logged for this pot yet.</p>
      )}
    </section>
  );
}

function LineLogger({
  line,
  onRecord,
}: {
  line: DyeLogLine;
  onRecord: DyeLogPanelProps['onRecord'];
}) {
  const [adjusting, setAdjusting] = useState(false);
  const [text, setText] = useState(String(line.plannedAmount));
  const [busy, setBusy] = useState(false);
  const inputId = useId();
  const amount = parseAmount(text);

  const send = async (value?: number) => {
    setBusy(true);
    const ok = await onRecord(line.recipeLineId, value);
    setBusy(false);
    if (ok) setAdjusting(false);
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (amount !== null) void send(amount);
  };

  return (
    <div className="space-y-2">
      <p className="text-lg">
        <span className="font-bold">{line.name}</span> · planned{' '}
        {formatAmount(line.plannedAmount, line.unit)}
        {line.loggedAmount > 0 ? ` · logged ${formatAmount(line.loggedAmount, line.unit)}` : ''}
        {line.jarVolumeLeftMl !== null
          ? ` · jar has ${formatAmount(line.jarVolumeLeftMl, 'mL')} left`
          : ''}
      </p>
      <div className="grid grid-cols-2 gap-2">
        <Button
          size="hand"
          disabled={busy}
          aria-label={`Log as planned: ${line.name}`}
          onClick={() => void send()}
        >
          Log as planned
        </Button>
        <Button
          size="hand"
          variant="secondary"
          aria-expanded={adjusting}
          aria-label={`Adjust ${line.name}`}
          onClick={() => setAdjusting((open) => !open)}
        >
          Adjust
        </Button>
      </div>
      {adjusting ? (
        <form onSubmit={submit} className="grid grid-cols-[1fr_auto] items-end gap-2">
          <label htmlFor={inputId} className="col-span-2 font-bold">
            Amount of {line.name} that went in ({unitName(line.unit)})
          </label>
          <input
            id={inputId}
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            value={text}
            onChange={(event) => setText(event.target.value)}
            className={inputClass}
          />
          <Button size="hand" type="submit" disabled={busy || amount === null} className="w-auto">
            Log
          </Button>
        </form>
      ) : null}
    </div>
  );
}

function EntryRow({
  entry,
  line,
  onCorrect,
}: {
  entry: DyeLogEntry;
  line: DyeLogLine | undefined;
  onCorrect: DyeLogPanelProps['onCorrect'];
}) {
  const [open, setOpen] = useState(false);
  const [text, setText] = useState(String(entry.amount));
  const [reason, setReason] = useState('');
  const [busy, setBusy] = useState(false);
  const amountId = useId();
  const reasonId = useId();
  const amount = parseAmount(text);
  const replaced = entry.supersededById !== null;

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (amount === null || reason.trim() === '') return;
    setBusy(true);
    const ok = await onCorrect(entry.id, amount, reason.trim());
    setBusy(false);
    if (ok) setOpen(false);
  };

  return (
    <li className="space-y-2 rounded-xl border-2 border-wool-300 bg-wool-50 px-3 py-2">
      <p className={replaced ? 'text-vat-700 line-through' : 'text-lg'}>
        {clockTime(entry.addedAt)} · {entry.name} ·{' '}
        <span className="font-bold">{formatAmount(entry.amount, entry.unit)}</span> ·{' '}
        {entryStatus(entry)}
        {entry.reason ? ` (${entry.reason})` : ''}
      </p>
      {replaced ? null : (
        <Button
          variant="secondary"
          aria-expanded={open}
          aria-label={`Correct ${entry.name} at ${clockTime(entry.addedAt)}`}
          onClick={() => setOpen((o) => !o)}
        >
          Correct
        </Button>
      )}
      {open ? (
        <form onSubmit={(event) => void submit(event)} className="space-y-2">
          <label htmlFor={amountId} className="block font-bold">
            Right amount ({unitName(line?.unit ?? entry.unit)}; 0 voids the entry)
          </label>
          <input
            id={amountId}
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            value={text}
            onChange={(event) => setText(event.target.value)}
            className={inputClass}
          />
          <label htmlFor={reasonId} className="block font-bold">
            Why
          </label>
          <input
            id={reasonId}
            maxLength={200}
            value={reason}
            onChange={(event) => setReason(event.target.value)}
            className={inputClass}
          />
          <p>The first entry stays in the history, marked as replaced.</p>
          <Button
            size="hand"
            type="submit"
            disabled={busy || amount === null || reason.trim() === ''}
          >
            Save correction
          </Button>
        </form>
      ) : null}
    </li>
  );
}
