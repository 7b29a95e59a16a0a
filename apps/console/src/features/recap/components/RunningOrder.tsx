import { arrayMove } from '@dnd-kit/sortable';
import type { Recap } from '@vatside/contracts/gallery';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useState } from 'react';
import { SortableList } from '../../../components/SortableList.tsx';
import { useSaveRecap } from '../api.ts';
import { colorwaySlide, skeinSlide, slideOf, updateOf, type Slide } from '../slides.ts';
import { Candidates } from './Candidates.tsx';
import { RunningOrderItem } from './RunningOrderItem.tsx';

const sameOrder = (a: Slide[], b: Slide[]) =>
  JSON.stringify(updateOf(a)) === JSON.stringify(updateOf(b));

/**
 * The recap's running order: add featured skeins and the month's colorways, drag (or move with
 * the buttons or the keyboard) into order, write what to say on camera, then save.
 */
export function RunningOrder({
  slug,
  dyeAlongId,
  recap,
  canEdit,
}: {
  slug: string;
  dyeAlongId: string;
  recap: Recap;
  canEdit: boolean;
}) {
  const saved = recap.items.map(slideOf);
  const [slides, setSlides] = useState(saved);
  const save = useSaveRecap(slug, dyeAlongId);
  const [message, setMessage] = useState('');
  const keys = slides.map((s) => s.key);
  const inOrder = new Set(keys);
  // What may go in: the server's candidates plus anything taken out here and not yet saved.
  const skeins = [
    ...recap.candidates.skeins,
    ...saved.flatMap((s) => (s.kind === 'skein' ? [s.skein] : [])),
  ].filter((s) => !inOrder.has(s.id));
  const colorways = [
    ...recap.candidates.colorways,
    ...saved.flatMap((s) => (s.kind === 'colorway' ? [s.colorway] : [])),
  ].filter((c) => !inOrder.has(c.id));
  const dirty = !sameOrder(slides, saved);

  const change = (next: Slide[]) => {
    setSlides(next);
    setMessage('');
  };
  const move = (from: number, to: number) => {
    if (to < 0 || to >= slides.length || from === to) return;
    change(arrayMove(slides, from, to));
  };
  const onSave = async () => {
    const answer = await save.mutateAsync(updateOf(slides));
    setSlides(answer.items.map(slideOf));
    setMessage('Running order saved.');
  };

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-labelledby="order-title" className="min-w-0 space-y-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h3 id="order-title" className="font-display text-2xl font-semibold">
            Running order
          </h3>
          {canEdit ? (
            <div className="flex items-center gap-3">
              <p aria-live="polite" className="font-bold">
                {dirty ? 'Not saved yet' : message}
              </p>
              <Button disabled={!dirty || save.isPending} onClick={() => void onSave()}>
                {save.isPending ? 'Saving…' : 'Save running order'}
              </Button>
            </div>
          ) : null}
        </div>
        {save.error ? (
          <FormAlert>The running order was not saved: {save.error.message}</FormAlert>
        ) : null}
        {slides.length === 0 ? (
          <p className="text-lg">
            {canEdit
              ? 'Nothing in the recap yet. Add skeins and colorways from the list beside it.'
              : 'The host has not put anything in the recap yet.'}
          </p>
        ) : (
          <SortableList ids={keys} label="Recap running order" itemWord="item" onMove={move}>
            {slides.map((slide, index) => (
              <RunningOrderItem
                key={slide.key}
                slide={slide}
                number={index + 1}
                isLast={index === slides.length - 1}
                canEdit={canEdit}
                onMove={(by) => move(index, index + by)}
                onNote={(note) => change(slides.map((s, i) => (i === index ? { ...s, note } : s)))}
                onRemove={() => change(slides.filter((_, i) => i !== index))}
              />
            ))}
          </SortableList>
        )}
      </section>
      {canEdit ? (
        <Candidates
          skeins={skeins}
          colorways={colorways}
          onAddSkein={(skein) => change([...slides, skeinSlide(skein)])}
          onAddColorway={(colorway) => change([...slides, colorwaySlide(colorway)])}
        />
      ) : null}
    </div>
  );
}
