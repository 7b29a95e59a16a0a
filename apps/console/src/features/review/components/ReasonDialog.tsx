import { REVIEW_REASON_TEMPLATES, type ReasonTemplateId } from '@vatside/contracts/review';
import { Button } from '@vatside/ui/Button';
import { useEffect, useId, useRef, useState, type FormEvent, type KeyboardEvent } from 'react';
import type { DecisionInput } from '../api.ts';
import { reasonNames } from '../names.ts';

/** Tab and Shift+Tab wrap around inside the dialog, as in any modal. */
function keepFocusInside(event: KeyboardEvent<HTMLDivElement>) {
  // Tab reaches a radio group at its checked radio only.
  const focusable = [
    ...event.currentTarget.querySelectorAll<HTMLElement>('input, textarea, button'),
  ].filter(
    (el) =>
      !el.hasAttribute('disabled') &&
      !(el instanceof HTMLInputElement && el.type === 'radio' && !el.checked),
  );
  const [first, last] = [focusable[0], focusable.at(-1)];
  if (event.shiftKey && document.activeElement === first) {
    event.preventDefault();
    last?.focus();
  } else if (!event.shiftKey && document.activeElement === last) {
    event.preventDefault();
    first?.focus();
  }
}

export interface ReasonAsk {
  decision: 'needsChanges' | 'reject';
  /** Whose skein(s), e.g. "Ada Fenwick’s skein" or "3 selected skeins". */
  subject: string;
}

/**
 * Asks why a skein goes back or is declined: a template (keys 1–5) or the moderator's own
 * words. The sharer reads the reason, so it is required.
 */
export function ReasonDialog({
  ask,
  onSend,
  onCancel,
}: {
  ask: ReasonAsk;
  onSend: (reason: Pick<DecisionInput, 'reason' | 'reasonTemplate'>) => void;
  onCancel: () => void;
}) {
  const titleId = useId();
  const [template, setTemplate] = useState<ReasonTemplateId | 'own'>(REVIEW_REASON_TEMPLATES[0].id);
  const [own, setOwn] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const first = useRef<HTMLInputElement>(null);
  useEffect(() => first.current?.focus(), []);

  const verb = ask.decision === 'needsChanges' ? 'Send back' : 'Decline';

  function submit(event?: FormEvent) {
    event?.preventDefault();
    if (template !== 'own') return onSend({ reasonTemplate: template });
    if (own.trim().length < 3) return setProblem('Write a few words, so the maker knows why.');
    onSend({ reason: own.trim() });
  }

  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    if (event.key === 'Escape') {
      event.preventDefault();
      onCancel();
      return;
    }
    if (event.key === 'Tab') return keepFocusInside(event);
    if (event.target instanceof HTMLTextAreaElement) return;
    const picked = REVIEW_REASON_TEMPLATES[Number(event.key) - 1];
    if (/^[1-9]$/.test(event.key) && picked) {
      event.preventDefault();
      setTemplate(picked.id);
      document.getElementById(`${titleId}-${picked.id}`)?.focus();
    }
  }

  return (
    <div className="fixed inset-0 z-20 flex items-center justify-center bg-vat-950/50 p-4">
      <div
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        onKeyDown={onKeyDown}
        className="max-h-full w-full max-w-xl overflow-y-auto rounded-card bg-wool-50 p-6 shadow-card"
      >
        <form onSubmit={submit} className="space-y-4">
          <h2 id={titleId} className="font-display text-2xl font-semibold">
            {ask.decision === 'needsChanges' ? 'Ask for a change' : 'Decline'}: {ask.subject}
          </h2>
          <p className="text-vat-800">
            The maker reads this reason in their e-mail and on their skeins page.
          </p>
          <fieldset className="space-y-2">
            <legend className="font-bold">Reason</legend>
            {REVIEW_REASON_TEMPLATES.map((t, i) => (
              <label
                key={t.id}
                className="flex min-h-12 cursor-pointer items-start gap-3 rounded-xl border-2 border-wool-300 p-3 has-[:checked]:border-vat-800 has-[:checked]:bg-vat-100"
              >
                <input
                  ref={i === 0 ? first : undefined}
                  id={`${titleId}-${t.id}`}
                  type="radio"
                  name="reason"
                  className="mt-1 size-5"
                  checked={template === t.id}
                  onChange={() => setTemplate(t.id)}
                />
                <span>
                  <span className="font-bold">
                    <kbd className="mr-2 rounded border border-vat-800 px-1.5 font-sans">
                      {i + 1}
                    </kbd>
                    {reasonNames[t.id]}
                  </span>
                  <span className="block text-sm text-vat-800">{t.text}</span>
                </span>
              </label>
            ))}
            <label className="flex min-h-12 cursor-pointer items-start gap-3 rounded-xl border-2 border-wool-300 p-3 has-[:checked]:border-vat-800 has-[:checked]:bg-vat-100">
              <input
                type="radio"
                name="reason"
                className="mt-1 size-5"
                checked={template === 'own'}
                onChange={() => setTemplate('own')}
              />
              <span className="font-bold">In my own words</span>
            </label>
          </fieldset>
          {template === 'own' ? (
            <label className="block space-y-1">
              <span className="font-bold">Your reason to the maker</span>
              <textarea
                value={own}
                onChange={(e) => {
                  setOwn(e.target.value);
                  setProblem(null);
                }}
                maxLength={500}
                rows={3}
                aria-invalid={problem ? true : undefined}
                className="block w-full rounded-xl border-2 border-vat-800 bg-white p-3"
              />
              {problem ? (
                <span role="alert" className="block font-bold text-madder-800">
                  {problem}
                </span>
              ) : null}
            </label>
          ) : null}
          <div className="flex flex-wrap gap-3">
            <Button type="submit" variant={ask.decision === 'reject' ? 'danger' : 'primary'}>
              {verb}
            </Button>
            <Button variant="secondary" onClick={onCancel}>
              Cancel
            </Button>
          </div>
        </form>
      </div>
    </div>
  );
}
