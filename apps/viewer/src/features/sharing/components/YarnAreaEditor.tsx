import type { YarnCrop } from '@vatside/contracts/submissions';
import { Button } from '@vatside/ui/Button';
import { useRef, type KeyboardEvent, type PointerEvent } from 'react';
import { MIDDLE_AREA, moveCrop, resizeCrop, scaleCrop, type Corner } from '../crop.ts';

const KEY_STEP = 0.02;
const arrows: Record<string, [number, number]> = {
  ArrowLeft: [-KEY_STEP, 0],
  ArrowRight: [KEY_STEP, 0],
  ArrowUp: [0, -KEY_STEP],
  ArrowDown: [0, KEY_STEP],
};

type Drag = { mode: 'move' | Corner; startX: number; startY: number; start: YarnCrop };

const pct = (v: number) => `${(v * 100).toFixed(2)}%`;

/**
 * The photo with a box the sharer puts over the yarn: drag the box or a corner (finger or
 * mouse), arrow keys move it and Shift + arrows resize it, and big buttons do the same.
 */
export function YarnAreaEditor({
  src,
  label,
  crop,
  onChange,
}: {
  src: string;
  /** e.g. "Photo 1": names the box and its buttons. */
  label: string;
  crop: YarnCrop;
  onChange: (crop: YarnCrop) => void;
}) {
  const frame = useRef<HTMLDivElement>(null);
  const drag = useRef<Drag | null>(null);

  function begin(mode: Drag['mode']) {
    return (event: PointerEvent<HTMLElement>) => {
      event.preventDefault();
      event.stopPropagation();
      event.currentTarget.setPointerCapture(event.pointerId);
      drag.current = { mode, startX: event.clientX, startY: event.clientY, start: crop };
    };
  }

  function follow(event: PointerEvent<HTMLElement>) {
    const d = drag.current;
    const box = frame.current?.getBoundingClientRect();
    if (!d || !box || box.width === 0 || box.height === 0) return;
    const dx = (event.clientX - d.startX) / box.width;
    const dy = (event.clientY - d.startY) / box.height;
    onChange(d.mode === 'move' ? moveCrop(d.start, dx, dy) : resizeCrop(d.start, d.mode, dx, dy));
  }

  const end = () => {
    drag.current = null;
  };

  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    const step = arrows[event.key];
    if (!step) return;
    event.preventDefault();
    const [dx, dy] = step;
    onChange(event.shiftKey ? resizeCrop(crop, 'bottomRight', dx, dy) : moveCrop(crop, dx, dy));
  }

  const placed = {
    left: pct(crop.x),
    top: pct(crop.y),
    width: pct(crop.width),
    height: pct(crop.height),
  };

  const handle = (corner: Corner) => (
    <span
      aria-hidden="true"
      onPointerDown={begin(corner)}
      onPointerMove={follow}
      onPointerUp={end}
      onPointerCancel={end}
      className={[
        'absolute size-11 touch-none rounded-full border-4 border-white bg-marigold-500 shadow',
        corner === 'topLeft'
          ? '-top-5 -left-5 cursor-nwse-resize'
          : '-right-5 -bottom-5 cursor-nwse-resize',
      ].join(' ')}
    />
  );

  return (
    <div className="space-y-3">
      <div ref={frame} className="relative mx-5 my-5 select-none">
        <img
          src={src}
          alt={`${label}, with the yarn area marked`}
          className="block h-auto w-full rounded-lg"
          draggable={false}
        />
        {/* Dims what lies outside the box, clipped to the photo. */}
        <div
          aria-hidden="true"
          className="pointer-events-none absolute inset-0 overflow-hidden rounded-lg"
        >
          <div className="absolute shadow-[0_0_0_9999px_rgb(10_31_43/0.55)]" style={placed} />
        </div>
        <div
          role="group"
          tabIndex={0}
          aria-label={`Yarn area on ${label}: arrow keys move it, Shift and arrow keys resize it`}
          aria-description={`From ${Math.round(crop.x * 100)} % across and ${Math.round(crop.y * 100)} % down, ${Math.round(crop.width * 100)} % wide and ${Math.round(crop.height * 100)} % tall`}
          onKeyDown={onKeyDown}
          onPointerDown={begin('move')}
          onPointerMove={follow}
          onPointerUp={end}
          onPointerCancel={end}
          className="absolute cursor-move touch-none rounded-sm border-4 border-marigold-300 outline-offset-4"
          style={placed}
        >
          {handle('topLeft')}
          {handle('bottomRight')}
        </div>
      </div>
      <div className="grid grid-cols-2 gap-2">
        <Button
          variant="secondary"
          onClick={() => onChange(scaleCrop(crop, 1 / 1.2))}
          aria-label={`Smaller yarn area on ${label}`}
        >
          Smaller
        </Button>
        <Button
          variant="secondary"
          onClick={() => onChange(scaleCrop(crop, 1.2))}
          aria-label={`Bigger yarn area on ${label}`}
        >
          Bigger
        </Button>
        <Button
          variant="secondary"
          onClick={() => onChange(MIDDLE_AREA)}
          aria-label={`Yarn in the middle of ${label}`}
        >
          Middle
        </Button>
        <Button
          variant="secondary"
          onClick={() => onChange({ x: 0, y: 0, width: 1, height: 1 })}
          aria-label={`Yarn fills all of ${label}`}
        >
          Whole photo
        </Button>
      </div>
    </div>
  );
}
