import { maxAnswerLength, type Question, type QuestionSort } from '@vatside/contracts/questions';
import { Button } from '@vatside/ui/Button';
import { useId, useState, type FormEvent } from 'react';
import { clockTime } from '../utils/dye-log.ts';

export type QuestionQueueProps = {
  questions: Question[];
  refusal: string | null;
  onAnswer: (questionId: string, answer: string) => Promise<boolean>;
  onHide: (questionId: string, hidden: boolean) => Promise<boolean>;
  onMute: (questionId: string, muted: boolean) => Promise<boolean>;
};

const sorters: Record<QuestionSort, (a: Question, b: Question) => number> = {
  time: (a, b) => Date.parse(a.askedAt) - Date.parse(b.askedAt),
  meToo: (a, b) => b.meTooCount - a.meTooCount || sorters.time(a, b),
};

/** The viewers' questions for the host and moderators: answer, hide, or mute an asker. */
export function QuestionQueue({
  questions,
  refusal,
  onAnswer,
  onHide,
  onMute,
}: QuestionQueueProps) {
  const [sort, setSort] = useState<QuestionSort>('time');
  const sorted = [...questions].sort(sorters[sort]);
  return (
    <div className="space-y-3">
      <div role="group" aria-label="Sort questions" className="flex flex-wrap gap-2">
        <Button
          variant={sort === 'time' ? 'primary' : 'secondary'}
          aria-pressed={sort === 'time'}
          onClick={() => setSort('time')}
        >
          Oldest first
        </Button>
        <Button
          variant={sort === 'meToo' ? 'primary' : 'secondary'}
          aria-pressed={sort === 'meToo'}
          onClick={() => setSort('meToo')}
        >
          Most “me too”
        </Button>
      </div>
      {refusal ? (
        <p role="alert" className="font-bold text-madder-800">
          {refusal}
        </p>
      ) : null}
      {sorted.length === 0 ? <p>No questions yet.</p> : null}
      <ol aria-label="Questions" className="space-y-3">
        {sorted.map((question) => (
          <QuestionRow
            key={question.id}
            question={question}
            onAnswer={onAnswer}
            onHide={onHide}
            onMute={onMute}
          />
        ))}
      </ol>
    </div>
  );
}

function QuestionRow({
  question,
  onAnswer,
  onHide,
  onMute,
}: { question: Question } & Omit<QuestionQueueProps, 'questions' | 'refusal'>) {
  const [answer, setAnswer] = useState(question.answer);
  const [busy, setBusy] = useState(false);
  const answerId = useId();
  const run = async (work: () => Promise<boolean>) => {
    setBusy(true);
    await work();
    setBusy(false);
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    void run(() => onAnswer(question.id, answer.trim()));
  };

  return (
    <li
      aria-label={`Question from ${question.askerName}`}
      className="space-y-2 rounded-xl border-2 border-wool-300 bg-wool-50 p-3"
    >
      <p className="text-lg font-bold">{question.text}</p>
      <p className="text-vat-800">
        {question.askerName} · {clockTime(question.askedAt)} · {question.meTooCount} “me too”
        {question.hidden ? ' · hidden from viewers' : ''}
        {question.askerMuted ? ' · asker muted' : ''}
      </p>
      {question.answeredAt ? (
        <p className="rounded-lg bg-leaf-100 px-2 py-1">
          <span className="font-bold">Answered</span>
          {question.answer ? `: ${question.answer}` : ' on the stream'}
        </p>
      ) : null}
      <form onSubmit={submit} className="space-y-2">
        <label htmlFor={answerId} className="block font-bold">
          Short answer (optional)
        </label>
        <input
          id={answerId}
          maxLength={maxAnswerLength}
          value={answer}
          onChange={(event) => setAnswer(event.target.value)}
          className="min-h-12 w-full rounded-xl border-2 border-vat-800 bg-wool-50 px-3 text-lg focus-visible:outline-4 focus-visible:outline-vat-600"
        />
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={busy}>
            {question.answeredAt ? 'Update answer' : 'Mark answered'}
          </Button>
          <Button
            variant="secondary"
            disabled={busy}
            onClick={() => void run(() => onHide(question.id, !question.hidden))}
          >
            {question.hidden ? 'Show again' : 'Hide'}
          </Button>
          <Button
            variant="danger"
            disabled={busy}
            onClick={() => void run(() => onMute(question.id, !question.askerMuted))}
          >
            {question.askerMuted ? 'Unmute asker' : 'Mute asker'}
          </Button>
        </div>
      </form>
    </li>
  );
}
