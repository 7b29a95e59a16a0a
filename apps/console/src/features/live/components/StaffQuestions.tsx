import { useQuestionQueue } from '../hooks/use-question-queue.ts';
import type { LiveSocket } from '../socket.ts';
import { QuestionQueue } from './QuestionQueue.tsx';

/** The question queue wired to the session's socket, for the board and the moderators’ page. */
export function StaffQuestions({ socket, sessionId }: { socket: LiveSocket; sessionId: string }) {
  const { queue, refusal, answer, hide, mute } = useQuestionQueue(socket, sessionId);
  if (!queue && !refusal) return <p>Loading the questions…</p>;
  return (
    <QuestionQueue
      questions={queue?.questions ?? []}
      refusal={refusal}
      onAnswer={answer}
      onHide={hide}
      onMute={mute}
    />
  );
}
