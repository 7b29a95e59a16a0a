import { useQuery } from '@tanstack/react-query';
import type { BulkResult, ReviewSubmission } from '@vatside/contracts/review';
import { submissionStatusSchema, type SubmissionStatus } from '@vatside/contracts/submissions';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Pager } from '../../../components/Pager.tsx';
import { QueryView } from '../../../components/QueryView.tsx';
import { firstPage } from '../../../lib/studio-path.ts';
import {
  reviewMonthsQueryOptions,
  reviewQueueQueryOptions,
  useDecide,
  useDecideMany,
  type DecisionInput,
} from '../api.ts';
import { useReviewKeys } from '../hooks/use-review-keys.ts';
import type { ReviewKey } from '../keys.ts';
import { actionNames } from '../names.ts';
import { KeyLegend } from './KeyLegend.tsx';
import { MonthFilter, StatusFilter } from './QueueFilters.tsx';
import { ReasonDialog, type ReasonAsk } from './ReasonDialog.tsx';
import { featureBlock, SkeinCard, type CardAction } from './SkeinCard.tsx';

type Notice = { tone: 'done' | 'problem'; text: string };
type Asking = ReasonAsk & { ids: string[]; bulk: boolean };

const skeinOf = (name: string) => `${name}’s skein`;
const messageOf = (error: unknown) =>
  error instanceof ApiError ? error.message : 'That did not go through. Try again.';

/** How a bulk decision went: how many took, and the server's word on each refusal. */
function bulkNotice(result: BulkResult, action: string, names: Map<string, string>): Notice {
  const done = result.results.filter((r) => r.ok).length;
  const refused = result.results.flatMap((r) =>
    r.ok ? [] : [`${skeinOf(names.get(r.submissionId) ?? 'A')}: ${r.error.message}`],
  );
  const head = `${action}: ${done} of ${result.results.length} skeins.`;
  return refused.length
    ? { tone: 'problem', text: [head, ...refused].join(' ') }
    : { tone: 'done', text: head };
}

/** The moderators' queue: one skein at a time by keyboard, or many at once by selection. */
export function ReviewQueue({ slug }: { slug: string }) {
  const [params, setParams] = useSearchParams();
  const status: SubmissionStatus = submissionStatusSchema
    .catch('waiting')
    .parse(params.get('status'));
  const dyeAlongId = params.get('dyeAlong') ?? undefined;
  const offset = Math.max(0, Number(params.get('offset')) || 0);
  const queue = useQuery(
    reviewQueueQueryOptions(slug, { status, dyeAlongId }, { ...firstPage, offset }),
  );
  const months = useQuery(reviewMonthsQueryOptions(slug));
  const decide = useDecide(slug);
  const decideMany = useDecideMany(slug);

  const [cursor, setCursor] = useState(0);
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [asking, setAsking] = useState<Asking | null>(null);
  const [notice, setNotice] = useState<Notice | null>(null);
  const cards = useRef(new Map<string, HTMLElement>());
  const wantFocus = useRef(false);

  const items = queue.data?.items ?? [];
  const at = Math.min(cursor, Math.max(0, items.length - 1));
  const current: ReviewSubmission | undefined = items[at];

  // After a key press the current skein takes the focus, also when a decision removed the last.
  useEffect(() => {
    if (!wantFocus.current || !current) return;
    cards.current.get(current.id)?.focus();
    wantFocus.current = false;
  }, [current]);

  /** A new filter starts again at the first page, the first skein and no selection. */
  function setFilter(next: Partial<Record<'dyeAlong' | 'status' | 'offset', string | undefined>>) {
    const merged = new URLSearchParams(params);
    for (const [key, value] of Object.entries({ offset: undefined, ...next })) {
      if (value) merged.set(key, value);
      else merged.delete(key);
    }
    setParams(merged, { replace: true });
    setCursor(0);
    setSelected(new Set());
  }

  function send(skein: ReviewSubmission, input: DecisionInput) {
    setNotice(null);
    wantFocus.current = true;
    decide.mutate(
      { submissionId: skein.id, ...input },
      {
        onSuccess: () =>
          setNotice({
            tone: 'done',
            text: `${actionNames[input.decision]}: ${skeinOf(skein.sharer.name)}.`,
          }),
        onError: (error) =>
          setNotice({
            tone: 'problem',
            text: `${skeinOf(skein.sharer.name)}: ${messageOf(error)}`,
          }),
      },
    );
  }

  function sendMany(ids: string[], input: DecisionInput) {
    setNotice(null);
    wantFocus.current = true;
    const names = new Map(items.map((s) => [s.id, s.sharer.name]));
    decideMany.mutate(
      { submissionIds: ids, ...input },
      {
        onSuccess: (result) => {
          setNotice(bulkNotice(result, actionNames[input.decision], names));
          setSelected((old) => {
            const next = new Set(old);
            for (const r of result.results) if (r.ok) next.delete(r.submissionId);
            return next;
          });
        },
        onError: (error) => setNotice({ tone: 'problem', text: messageOf(error) }),
      },
    );
  }

  function act(skein: ReviewSubmission, action: CardAction) {
    if (action === 'approve') return send(skein, { decision: 'approve' });
    if (action === 'feature') {
      if (skein.status === 'featured') return send(skein, { decision: 'unfeature' });
      const blocked = featureBlock(skein);
      if (blocked) return setNotice({ tone: 'problem', text: blocked });
      return send(skein, { decision: 'feature' });
    }
    setAsking({
      decision: action,
      subject: skeinOf(skein.sharer.name),
      ids: [skein.id],
      bulk: false,
    });
  }

  function toggle(id: string) {
    setSelected((old) => {
      const next = new Set(old);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  }

  function bulk(decision: 'approve' | 'reject') {
    const ids = items.filter((s) => selected.has(s.id)).map((s) => s.id);
    if (ids.length === 0) {
      return setNotice({ tone: 'problem', text: 'Select skeins first (X, or their Select box).' });
    }
    if (decision === 'approve') return sendMany(ids, { decision: 'approve' });
    setAsking({ decision: 'reject', subject: `${ids.length} selected skeins`, ids, bulk: true });
  }

  function onKey(key: ReviewKey) {
    if (key.kind === 'bulkApprove') return bulk('approve');
    if (key.kind === 'bulkReject') return bulk('reject');
    if (!current) return;
    wantFocus.current = true;
    switch (key.kind) {
      case 'move': {
        const next = Math.min(items.length - 1, Math.max(0, at + key.by));
        setCursor(next);
        cards.current.get(items[next]!.id)?.focus();
        wantFocus.current = false;
        return;
      }
      case 'select':
        return toggle(current.id);
      case 'approve':
      case 'needsChanges':
      case 'reject':
      case 'feature':
        return act(current, key.kind);
    }
  }
  useReviewKeys(onKey, asking === null);

  function closeDialog() {
    setAsking(null);
    wantFocus.current = true;
    if (current) cards.current.get(current.id)?.focus();
  }

  const busy = decide.isPending || decideMany.isPending;
  const selectedShown = items.filter((s) => selected.has(s.id)).length;

  return (
    <div className="grid items-start gap-6 lg:grid-cols-[1fr_19rem]">
      <div className="min-w-0 space-y-4">
        <div className="grid gap-3 sm:grid-cols-2">
          <MonthFilter
            months={months.data?.items ?? []}
            value={dyeAlongId}
            onChange={(id) => setFilter({ dyeAlong: id })}
          />
          <StatusFilter
            value={status}
            onChange={(s) => setFilter({ status: s === 'waiting' ? undefined : s })}
          />
        </div>
        <div
          role="region"
          aria-label="Selection"
          className="flex flex-wrap items-center gap-3 rounded-xl border-2 border-wool-300 bg-wool-100 p-3"
        >
          <p className="font-bold" aria-live="polite">
            {selectedShown === 0 ? 'No skeins selected' : `${selectedShown} selected`}
          </p>
          <Button disabled={busy || selectedShown === 0} onClick={() => bulk('approve')}>
            Approve selected
          </Button>
          <Button
            variant="danger"
            disabled={busy || selectedShown === 0}
            onClick={() => bulk('reject')}
          >
            Decline selected
          </Button>
          <Button
            variant="secondary"
            disabled={items.length === 0}
            onClick={() => setSelected(new Set(items.map((s) => s.id)))}
          >
            Select all shown
          </Button>
          <Button
            variant="secondary"
            disabled={selected.size === 0}
            onClick={() => setSelected(new Set())}
          >
            Clear selection
          </Button>
        </div>
        <div aria-live="polite">
          {notice ? <FormAlert tone={notice.tone}>{notice.text}</FormAlert> : null}
        </div>
        <QueryView
          query={queue}
          loading="Gathering shared skeins…"
          failed="The queue could not be loaded"
        >
          {(data) =>
            data.items.length === 0 ? (
              <p className="rounded-card border border-dashed border-wool-300 bg-wool-50 p-5 text-lg">
                {status === 'waiting'
                  ? 'Nothing waits for review. New shares appear here, oldest first.'
                  : 'No skeins in this status.'}
              </p>
            ) : (
              <div className="space-y-4">
                <ol aria-label="Shared skeins" className="space-y-4">
                  {data.items.map((skein, i) => (
                    <li key={skein.id}>
                      <SkeinCard
                        skein={skein}
                        current={i === at}
                        selected={selected.has(skein.id)}
                        busy={busy}
                        ref={(el) => {
                          if (el) cards.current.set(skein.id, el);
                          else cards.current.delete(skein.id);
                        }}
                        onFocus={() => setCursor(i)}
                        onAction={(action) => act(skein, action)}
                        onSelect={() => toggle(skein.id)}
                      />
                    </li>
                  ))}
                </ol>
                <Pager
                  page={data.page}
                  noun="skeins"
                  onOffset={(o) => setFilter({ offset: o ? String(o) : undefined })}
                />
              </div>
            )
          }
        </QueryView>
      </div>
      <aside className="order-first rounded-card border border-wool-200 bg-wool-50 p-4 lg:sticky lg:top-4 lg:order-none">
        <KeyLegend />
      </aside>
      {asking ? (
        <ReasonDialog
          ask={asking}
          onCancel={closeDialog}
          onSend={(reason) => {
            const { ids, decision, bulk } = asking;
            setAsking(null);
            const one = items.find((s) => s.id === ids[0]);
            if (!bulk && one) send(one, { decision, ...reason });
            else sendMany(ids, { decision, ...reason });
          }}
        />
      ) : null}
    </div>
  );
}
