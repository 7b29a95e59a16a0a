import { isTimerDone, type PotTimer } from '@vatside/contracts/pot-timer';
import type { LiveProgram } from '@vatside/contracts/live-program';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { SafetyNote } from '@vatside/ui/SafetyNote';
import { useMemo } from 'react';
import { useChime } from '../hooks/use-chime.ts';
import { useKit } from '../hooks/use-kit.ts';
import { useLiveSession, type JoinRefusal } from '../hooks/use-live-session.ts';
import { useLiveSocket } from '../hooks/use-live-socket.ts';
import { useOwnPace } from '../hooks/use-own-pace.ts';
import { useQuestions } from '../hooks/use-questions.ts';
import { useServerClock } from '../hooks/use-server-clock.ts';
import { useTicker } from '../hooks/use-ticker.ts';
import { useTimerAlarms, type TimerWatch } from '../hooks/use-timer-alarms.ts';
import { useWakeLock } from '../hooks/use-wake-lock.ts';
import { scalePot } from '../utils/amounts.ts';
import { offersBothKinds } from '../../../lib/kit.ts';
import { FollowStatus } from './FollowStatus.tsx';
import { HostNotes } from './HostNotes.tsx';
import { KitSettings } from './KitSettings.tsx';
import { LiveTopBar } from './LiveTopBar.tsx';
import { OfflineBanner } from './OfflineBanner.tsx';
import { PotCard } from './PotCard.tsx';
import { QuestionsSection } from './QuestionsSection.tsx';
import { SoundPrompt } from './SoundPrompt.tsx';
import { SoundSwitch } from './SoundSwitch.tsx';

const counting = (timer: PotTimer, nowMs: number) =>
  timer.state === 'running' && !isTimerDone(timer, nowMs);

const refusalTitles: Partial<Record<JoinRefusal['code'], string>> = {
  NOT_FOUND: 'This session is not on the stove',
  FORBIDDEN: 'This is a private rehearsal',
  UNAUTHENTICATED: 'This is a private rehearsal',
  VALIDATION_FAILED: 'This link does not lead to a session',
};

/** The follow-along: every pot with its step, the viewer's amounts and a synced countdown. */
export function LiveFollowScreen({ program }: { program: LiveProgram }) {
  const socket = useLiveSocket();
  const { serverNow } = useServerClock(socket);
  const { state, connection, refusal } = useLiveSession(socket, program.sessionId);
  const { kit, setKit } = useKit();
  const own = useOwnPace(program.sessionId);
  const chime = useChime();
  const wakeLock = useWakeLock(true);
  const questions = useQuestions(socket, program.sessionId);

  const serverNowMs = serverNow();
  const localNowMs = Date.now();
  const hostPots = new Map(state?.pots.map((pot) => [pot.potId, pot]));
  const scaled = useMemo(
    () => new Map(program.pots.map((pot) => [pot.potId, scalePot(pot, kit)])),
    [program, kit],
  );

  const watches: TimerWatch[] = program.pots.flatMap((pot) => {
    const mine = own.ownPace[pot.potId];
    const timer = mine?.timer ?? hostPots.get(pot.potId)?.timer;
    if (timer?.state !== 'running') return [];
    const nowMs = mine ? localNowMs : serverNowMs;
    return [
      {
        key: `${pot.potId}:${mine ? 'own' : 'host'}:${timer.endsAtMs}`,
        done: !counting(timer, nowMs),
      },
    ];
  });
  useTimerAlarms(watches, chime.ring);
  useTicker(watches.some((watch) => !watch.done));

  return (
    <div className="flex min-h-dvh flex-col">
      <LiveTopBar program={program} />
      <OfflineBanner offline={connection === 'offline'} />
      {/* Phone: one column, notes and kit above the pots. Wide screens: the pots on the left,
          the rest beside them. */}
      <main
        id="main"
        className="mx-auto grid w-full max-w-6xl flex-1 content-start gap-5 px-4 py-4 lg:grid-cols-[minmax(0,1fr)_22rem] lg:grid-rows-[auto_1fr]"
      >
        <div className="space-y-4 lg:col-start-2 lg:row-start-1">
          <FollowStatus connection={connection} wakeLock={wakeLock} />
          {refusal ? (
            <ErrorPanel
              title={refusalTitles[refusal.code] ?? 'The session could not be joined'}
              error={{ message: refusal.message }}
            />
          ) : null}
          {state?.mode === 'rehearsal' ? (
            <p className="rounded-xl border-2 border-vat-800 bg-vat-100 px-4 py-3 text-lg font-bold">
              Rehearsal: only the studio’s host sees this session.
            </p>
          ) : null}
          {state?.status === 'ended' ? (
            <section
              aria-label="Session ended"
              className="rounded-card border-2 border-leaf-700 bg-leaf-100 px-4 py-3"
            >
              <p className="text-xl font-bold">
                The live dye-along has ended. Thank you for dyeing along!
              </p>
              <p className="text-lg">
                Your pots stay here: go at your own pace to finish them at your stove’s speed.
              </p>
            </section>
          ) : null}
          {chime.choice === null ? <SoundPrompt onYes={chime.turnOn} onNo={chime.turnOff} /> : null}
          <HostNotes notes={state?.notes ?? []} />
          <KitSettings kit={kit} onChange={setKit} askDyeKind={offersBothKinds(program)} />
        </div>
        <div className="grid items-start gap-5 md:grid-cols-2 lg:col-start-1 lg:row-span-2 lg:row-start-1">
          {program.pots.map((pot) => (
            <PotCard
              key={pot.potId}
              pot={pot}
              host={hostPots.get(pot.potId)}
              own={own.ownPace[pot.potId]}
              scaled={scaled.get(pot.potId) ?? null}
              kit={kit}
              serverNowMs={serverNowMs}
              localNowMs={localNowMs}
              onOwnPace={() => own.begin(pot, hostPots.get(pot.potId), serverNow())}
              onPress={(action) => own.press(pot, action)}
              onBackToHost={() => own.backToHost(pot.potId)}
            />
          ))}
        </div>
        <div className="space-y-4 lg:col-start-2 lg:row-start-2">
          <QuestionsSection
            queue={questions.queue}
            refusal={questions.refusal}
            backTo={`/live/${program.sessionId}`}
            onAsk={questions.ask}
            onMeToo={questions.meToo}
          />
          {chime.choice !== null ? (
            <SoundSwitch choice={chime.choice} onTurnOn={chime.turnOn} onTurnOff={chime.turnOff} />
          ) : null}
          <SafetyNote />
        </div>
      </main>
    </div>
  );
}
