import { useQuery } from '@tanstack/react-query';
import type { DyeLogPot } from '@vatside/contracts/dye-log';
import type { HostAction, LiveState } from '@vatside/contracts/live';
import type { LiveProgram } from '@vatside/contracts/live-program';
import type { MeasureSystem } from '@vatside/dye-kit';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { useMemo, useRef, useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { liveProgramQueryOptions, viewerPathOf } from '../api.ts';
import { useDyeLog } from '../hooks/use-dye-log.ts';
import { useHostActions } from '../hooks/use-host-actions.ts';
import { useHostSession, type Connection } from '../hooks/use-host-session.ts';
import { useHostSocket } from '../hooks/use-host-socket.ts';
import { usePotKeys } from '../hooks/use-pot-keys.ts';
import { useServerClock } from '../hooks/use-server-clock.ts';
import { useTicker } from '../hooks/use-ticker.ts';
import { amountNote, stepAmount } from '../utils/amounts.ts';
import type { KeyCommand } from '../utils/keys.ts';
import { timerToggle } from '../utils/timer-control.ts';
import type { LiveSocket } from '../socket.ts';
import { BoardBar } from './BoardBar.tsx';
import { DyeLogPanel, type DyeLogPanelProps } from './DyeLogPanel.tsx';
import { EndSession } from './EndSession.tsx';
import { NoteToPhones } from './NoteToPhones.tsx';
import { PotCard } from './PotCard.tsx';
import { ShortcutList } from './ShortcutList.tsx';
import { StaffQuestions } from './StaffQuestions.tsx';
import { StreamDelayForm } from './StreamDelayForm.tsx';
import { ViewerLink } from './ViewerLink.tsx';

/** The live control screen: joins the session and keeps it on screen through drops. */
export function LiveBoard({
  sessionId,
  system,
  leaveTo,
}: {
  sessionId: string;
  system: MeasureSystem;
  /** Where "Leave the board" and the end screen lead: the studio's stovetop. */
  leaveTo: string;
}) {
  const socket = useHostSocket();
  const session = useHostSession(socket, sessionId);
  const serverNow = useServerClock(socket);
  const program = useQuery(liveProgramQueryOptions(sessionId));
  const actions = useHostActions(socket, sessionId);

  if (session.refusal && !session.state) {
    return (
      <Frame>
        <ErrorPanel title="This session could not be opened" error={session.refusal} />
        <Link to={leaveTo} className={textLinkClass}>
          Back to the stovetop
        </Link>
      </Frame>
    );
  }
  if (program.isError) {
    return (
      <Frame>
        <ErrorPanel
          title="The run sheets could not be loaded"
          error={program.error}
          onRetry={() => void program.refetch()}
          retrying={program.isFetching}
        />
      </Frame>
    );
  }
  if (!session.state || !program.data) {
    return <LoadingBlock label="Setting out the pots…" />;
  }
  if (session.state.status === 'ended') {
    return <SessionEnded mode={session.state.mode} leaveTo={leaveTo} />;
  }
  return (
    <Board
      socket={socket}
      state={session.state}
      program={program.data}
      viewerCount={session.viewerCount}
      connection={session.connection}
      serverNow={serverNow}
      system={system}
      leaveTo={leaveTo}
      refusals={actions.refusals}
      send={actions.send}
    />
  );
}

function Board({
  socket,
  state,
  program,
  viewerCount,
  connection,
  serverNow,
  system,
  leaveTo,
  refusals,
  send,
}: {
  socket: LiveSocket;
  state: LiveState;
  program: LiveProgram;
  viewerCount: number | undefined;
  connection: Connection;
  serverNow: () => number;
  system: MeasureSystem;
  leaveTo: string;
  refusals: Record<string, string>;
  send: (action: HostAction) => Promise<boolean>;
}) {
  const nowMs = useTicker(serverNow);
  const [chosen, setChosen] = useState<number | null>(null);
  const [keyHint, setKeyHint] = useState('');
  const potRefs = useRef<(HTMLElement | null)[]>([]);
  const rehearsal = state.mode === 'rehearsal';
  const programPot = (potId: string) => program.pots.find((p) => p.potId === potId);
  const dyeLog = useDyeLog(socket, state.sessionId);
  const logPot = (potId: string) => dyeLog.log.data?.pots.find((p) => p.potId === potId);

  usePotKeys((command: KeyCommand) => {
    if (command.kind === 'choosePot') {
      const card = potRefs.current[command.potIndex];
      if (!card) return setKeyHint(`There is no pot ${command.potIndex + 1}.`);
      setChosen(command.potIndex);
      setKeyHint('');
      card.focus();
      return;
    }
    const pot = chosen === null ? undefined : state.pots[chosen];
    if (!pot) return setKeyHint('Press a pot’s number first.');
    setKeyHint('');
    if (command.kind === 'step') {
      return void send({ type: command.type, potId: pot.potId, fromStep: pot.stepIndex });
    }
    if (command.kind === 'extend') {
      return void send({ type: 'timer:extend', potId: pot.potId, byMs: command.byMs });
    }
    const toggle = timerToggle(pot.timer, serverNow());
    if (toggle) void send({ type: toggle.type, potId: pot.potId });
    else setKeyHint('This step has no timer: the plus key adds one.');
  });

  const amounts = useMemo(
    () =>
      state.pots.flatMap((pot, index) => {
        const potProgram = program.pots.find((p) => p.potId === pot.potId);
        const amount = potProgram
          ? stepAmount(potProgram, potProgram.steps[pot.stepIndex], system)
          : null;
        return amount ? [{ potNumber: index + 1, note: amountNote(pot.colorwayName, amount) }] : [];
      }),
    [state.pots, program, system],
  );

  return (
    <div className="min-h-dvh">
      <BoardBar
        title={program.dyeAlong.title}
        mode={state.mode}
        viewerCount={viewerCount}
        connection={connection}
        leaveTo={leaveTo}
      />
      {rehearsal ? (
        <p className="bg-marigold-300 px-4 py-2 text-center text-xl font-bold text-vat-950">
          REHEARSAL — only you can see this. When it ends it is discarded.
        </p>
      ) : null}
      {connection === 'offline' ? (
        <p
          role="alert"
          className="bg-madder-700 px-4 py-2 text-center text-xl font-bold text-wool-50"
        >
          Offline — reconnecting. The timers keep running on the server; the buttons send nothing
          until the connection is back.
        </p>
      ) : null}
      <main id="main" className="space-y-4 p-4">
        <div className="grid grid-cols-[repeat(auto-fit,minmax(18rem,1fr))] items-start gap-4">
          {state.pots.map((pot, index) => (
            <div key={pot.potId} className="space-y-2">
              <PotCard
                ref={(card) => {
                  potRefs.current[index] = card;
                }}
                index={index}
                pot={pot}
                program={programPot(pot.potId)}
                nowMs={nowMs}
                system={system}
                chosen={chosen === index}
                refusal={refusals[pot.potId]}
                onChoose={() => setChosen(index)}
                onAction={(action) => void send(action)}
              />
              <PotDyeLog
                log={logPot(pot.potId)}
                failed={dyeLog.log.isError}
                entries={dyeLog.log.data?.entries.filter((e) => e.potId === pot.potId) ?? []}
                refusal={dyeLog.refusals[pot.potId]}
                onRecord={(lineId, amount) => dyeLog.record(pot.potId, lineId, amount)}
                onCorrect={(entryId, amount, reason) =>
                  dyeLog.correct(pot.potId, entryId, amount, reason)
                }
              />
            </div>
          ))}
        </div>
        <div className="grid grid-cols-[repeat(auto-fit,minmax(18rem,1fr))] items-start gap-4">
          <SidePanel title="Questions">
            <StaffQuestions socket={socket} sessionId={state.sessionId} />
          </SidePanel>
          <SidePanel title="To every phone">
            <NoteToPhones
              amounts={amounts}
              recent={state.notes.slice(-3).reverse()}
              refusal={refusals['note:push']}
              onSend={send}
            />
          </SidePanel>
          <SidePanel title="Stream delay">
            <StreamDelayForm
              currentMs={state.streamDelayMs}
              refusal={refusals['delay:set']}
              onSend={send}
            />
          </SidePanel>
          <SidePanel title="Follow-along link">
            <ViewerLink
              url={`${window.location.origin}${viewerPathOf(state.sessionId)}`}
              rehearsal={rehearsal}
            />
          </SidePanel>
          <SidePanel title="Keys">
            <ShortcutList />
            <p role="status" className="mt-2 font-bold text-madder-800">
              {keyHint}
            </p>
          </SidePanel>
          <SidePanel title="Safety at the stove">
            <p>
              Hot baths and steam scald; acids and dye powders irritate skin, eyes and lungs. The
              amounts here are for yarn, never food or drink. Follow your dye maker’s safety data
              sheet.
            </p>
          </SidePanel>
          <SidePanel title="Finish">
            <EndSession rehearsal={rehearsal} refusal={refusals['session:end']} onSend={send} />
          </SidePanel>
        </div>
      </main>
    </div>
  );
}

/** A pot's dye log once it has loaded; a plain line while it loads or if it cannot. */
function PotDyeLog({
  log,
  failed,
  ...panel
}: { log: DyeLogPot | undefined; failed: boolean } & Omit<DyeLogPanelProps, 'pot'>) {
  if (failed) return <p role="alert">The dye log could not be loaded; reload the board.</p>;
  if (!log) return <p className="text-vat-800">The dye log is loading…</p>;
  return <DyeLogPanel pot={log} {...panel} />;
}

function SidePanel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card as="section" aria-label={title} className="space-y-3">
      <h2 className="font-display text-xl font-semibold">{title}</h2>
      {children}
    </Card>
  );
}

function Frame({ children }: { children: ReactNode }) {
  return <main className="mx-auto max-w-2xl space-y-4 p-6">{children}</main>;
}

function SessionEnded({ mode, leaveTo }: { mode: LiveState['mode']; leaveTo: string }) {
  return (
    <Frame>
      <h1 className="font-display text-3xl font-semibold">
        {mode === 'rehearsal' ? 'Rehearsal over' : 'The live session has ended'}
      </h1>
      <p className="text-lg">
        {mode === 'rehearsal'
          ? 'It has been discarded: nothing of it is kept in the month.'
          : 'Every phone now shows that it has ended.'}
      </p>
      <Link to={leaveTo} className={textLinkClass}>
        Back to the stovetop
      </Link>
    </Frame>
  );
}
