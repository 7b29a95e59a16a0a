import { useQuery } from '@tanstack/react-query';
import { buttonClass } from '@vatside/ui/Button';
import { Link, useParams } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import {
  currentLiveQueryOptions,
  startableDyeAlongsQueryOptions,
} from '../../features/live/api.ts';
import { StartSessionList } from '../../features/live/components/StartSessionList.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';

/** The stovetop: where the host lights the burners for the month's dye-along, or rehearses. */
export function Component() {
  const { slug = '' } = useParams();
  const { data: studio } = useQuery(studioQueryOptions(slug));
  if (studio?.myRole !== 'host') {
    return (
      <Panel title="Stovetop">
        <p className="text-lg">Only the studio’s host runs a live session or a rehearsal.</p>
        <QuestionQueueLink slug={slug} />
      </Panel>
    );
  }
  return <Stovetop slug={slug} />;
}

/** Moderators answer questions during the live session from their own page. */
function QuestionQueueLink({ slug }: { slug: string }) {
  const { data } = useQuery(currentLiveQueryOptions(slug));
  if (!data?.live) return null;
  return (
    <Link
      to={`${boardPath(slug)(data.live.sessionId)}/questions`}
      className={`${buttonClass('primary')} mt-4`}
    >
      Open the question queue
    </Link>
  );
}

const boardPath = (slug: string) => (sessionId: string) =>
  `/studios/${slug}/live/${encodeURIComponent(sessionId)}`;

function Stovetop({ slug }: { slug: string }) {
  const current = useQuery(currentLiveQueryOptions(slug));
  const startable = useQuery(startableDyeAlongsQueryOptions(slug));
  const live = current.data?.live;
  return (
    <div className="space-y-6">
      {live ? (
        <section
          aria-label="Live now"
          className="flex flex-wrap items-center justify-between gap-3 rounded-card border-2 border-madder-700 bg-madder-100 p-4"
        >
          <p className="text-lg font-bold">● Live now: {live.title}</p>
          <Link to={boardPath(slug)(live.sessionId)} className={buttonClass('danger')}>
            Back to the pot board
          </Link>
        </section>
      ) : null}
      <Panel
        title="Stovetop"
        intro={
          <>
            <p>
              Pick the month’s dye-along. <strong>Go live</strong> opens the pot board and the
              follow-along for every phone; it can go live from two hours before its start.
            </p>
            <p className="mt-2">
              <strong>Rehearse privately</strong> runs the same board with nobody watching. When you
              end a rehearsal it is discarded: the month, its status and its record stay exactly as
              they were.
            </p>
          </>
        }
      >
        <QueryView
          query={startable}
          loading="Finding this month’s dye-alongs…"
          failed="The dye-alongs could not be loaded"
        >
          {(dyeAlongs) => (
            <StartSessionList slug={slug} dyeAlongs={dyeAlongs} boardPath={boardPath(slug)} />
          )}
        </QueryView>
      </Panel>
    </div>
  );
}
