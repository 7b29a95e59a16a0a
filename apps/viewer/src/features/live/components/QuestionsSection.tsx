import { maxQuestionLength, type QuestionQueue } from '@vatside/contracts/questions';
import { withNext } from '@vatside/ui/account/next-path.ts';
import { Button } from '@vatside/ui/Button';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { useId, useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';

export type QuestionsSectionProps = {
  queue: QuestionQueue | undefined;
  refusal: string | null;
  /** Where sign-in brings the visitor back to. */
  backTo: string;
  onAsk: (text: string) => Promise<boolean>;
  onMeToo: (questionId: string) => Promise<boolean>;
};

/** Questions to the host: ask one, add "me too" to another's, and read the answers. */
export function QuestionsSection({
  queue,
  refusal,
  backTo,
  onAsk,
  onMeToo,
}: QuestionsSectionProps) {
  const headingId = useId();
  const signedIn = queue !== undefined && queue.view !== 'visitor';
  const questions = queue?.questions ?? [];
  return (
    <section
      aria-labelledby={headingId}
      className="space-y-3 rounded-card border-2 border-wool-300 bg-wool-50 p-4"
    >
      <h2 id={headingId} className="font-display text-2xl font-semibold">
        Questions
      </h2>
      {queue === undefined ? <p>Loading the questions…</p> : null}
      {signedIn && !queue.muted ? <AskForm onAsk={onAsk} /> : null}
      {queue?.muted ? <p>The host has paused your questions for this session.</p> : null}
      {queue?.view === 'visitor' ? (
        <p>
          <Link to={withNext('/sign-in', backTo)} className={textLinkClass}>
            Sign in to ask
          </Link>{' '}
          — answered questions show here for everyone.
        </p>
      ) : null}
      {refusal ? (
        <p role="alert" className="rounded-xl bg-marigold-100 px-3 py-2 font-bold">
          {refusal}
        </p>
      ) : null}
      {queue && questions.length === 0 ? <p>No questions yet.</p> : null}
      <ul aria-label="Questions so far" className="space-y-3">
        {questions.map((question) => {
          const mine = queue?.mine.includes(question.id) ?? false;
          const added = queue?.meToos.includes(question.id) ?? false;
          return (
            <li key={question.id} className="space-y-2 rounded-xl border-2 border-wool-200 p-3">
              <p className="text-lg font-bold">{question.text}</p>
              <p className="text-vat-800">
                {mine ? 'You asked' : question.askerName} · {question.meTooCount} “me too”
              </p>
              {question.answeredAt ? (
                <p className="rounded-lg bg-leaf-100 px-2 py-1">
                  <span className="font-bold">Host’s answer: </span>
                  {question.answer || 'answered on the stream.'}
                </p>
              ) : null}
              {signedIn && !mine ? (
                <Button
                  variant="secondary"
                  disabled={added}
                  aria-label={added ? 'You added “me too”' : `Me too: ${question.text}`}
                  onClick={() => void onMeToo(question.id)}
                >
                  {added ? '✓ Me too added' : 'Me too'}
                </Button>
              ) : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}

function AskForm({ onAsk }: { onAsk: (text: string) => Promise<boolean> }) {
  const [text, setText] = useState('');
  const [busy, setBusy] = useState(false);
  const fieldId = useId();
  const trimmed = text.trim();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!trimmed) return;
    setBusy(true);
    if (await onAsk(trimmed)) setText('');
    setBusy(false);
  };
  return (
    <form onSubmit={(event) => void submit(event)} className="space-y-2">
      <label htmlFor={fieldId} className="block font-bold">
        Your question to the host
      </label>
      <textarea
        id={fieldId}
        rows={2}
        maxLength={maxQuestionLength}
        value={text}
        onChange={(event) => setText(event.target.value)}
        className="w-full rounded-xl border-2 border-vat-800 bg-wool-50 px-3 py-2 text-lg focus-visible:outline-4 focus-visible:outline-vat-600"
      />
      <p className="text-sm text-vat-800">
        {text.length} of {maxQuestionLength} characters
      </p>
      <Button size="hand" type="submit" disabled={busy || !trimmed}>
        Send question
      </Button>
    </form>
  );
}
