import { Button } from '@vatside/ui/Button';
import { useId } from 'react';
import { MoveButtons, SortableItem } from '../../../components/SortableList.tsx';
import { slideTitle, type Slide } from '../slides.ts';

/** One entry: drag handle, thumbnail, what it is, the note to say on camera, move buttons. */
export function RunningOrderItem({
  slide,
  number,
  isLast,
  canEdit,
  onMove,
  onNote,
  onRemove,
}: {
  slide: Slide;
  number: number;
  isLast: boolean;
  canEdit: boolean;
  onMove: (by: -1 | 1) => void;
  onNote: (note: string) => void;
  onRemove: () => void;
}) {
  const noteId = useId();
  const title = slideTitle(slide);
  const photo = slide.kind === 'skein' ? slide.skein.photos[0] : slide.colorway.photo;
  return (
    <SortableItem
      id={slide.key}
      itemWord="item"
      number={number}
      canEdit={canEdit}
      label={`${number}. ${title}`}
    >
      {photo ? (
        <img
          src={photo.thumbUrl}
          width={photo.thumbWidth}
          height={photo.thumbHeight}
          loading="lazy"
          alt=""
          className="size-20 shrink-0 rounded-lg object-cover"
        />
      ) : null}
      <div className="min-w-0 flex-1 space-y-2">
        <p className="text-lg">
          <span className="mr-2 inline-flex size-8 items-center justify-center rounded-full bg-vat-800 font-bold text-wool-50">
            {number}
          </span>
          <span className="font-bold">{title}</span>
        </p>
        {slide.kind === 'skein' ? (
          <p className="text-vat-800">
            {slide.skein.baseName}
            {slide.skein.dyesUsed.length ? ` · ${slide.skein.dyesUsed.join(', ')}` : ''}
          </p>
        ) : null}
        {canEdit ? (
          <>
            <label htmlFor={noteId} className="block font-bold">
              Note for item {number} (what to say on camera)
            </label>
            <textarea
              id={noteId}
              value={slide.note}
              maxLength={500}
              rows={2}
              onChange={(e) => onNote(e.target.value)}
              className="w-full rounded-lg border-2 border-wool-300 p-2"
            />
            <div className="flex flex-wrap gap-2">
              <MoveButtons itemWord="item" number={number} isLast={isLast} onMove={onMove} />
              <Button
                variant="secondary"
                onClick={onRemove}
                aria-label={`Take out item ${number} from the recap`}
              >
                Take out
              </Button>
            </div>
          </>
        ) : slide.note ? (
          <p>
            <span className="font-bold">Note:</span> {slide.note}
          </p>
        ) : null}
      </div>
    </SortableItem>
  );
}
