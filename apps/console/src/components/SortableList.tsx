import {
  closestCenter,
  DndContext,
  KeyboardSensor,
  PointerSensor,
  useSensor,
  useSensors,
  type DragEndEvent,
} from '@dnd-kit/core';
import {
  SortableContext,
  sortableKeyboardCoordinates,
  useSortable,
  verticalListSortingStrategy,
} from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { Button } from '@vatside/ui/Button';
import type { ReactNode } from 'react';

// An ordered list the host rearranges (run sheet steps, the recap's running order): drag by the
// handle, or press the move buttons, which suit the keyboard and wet thumbs alike.

export function SortableList({
  ids,
  label,
  itemWord,
  onMove,
  children,
}: {
  ids: string[];
  label: string;
  /** What one entry is called, e.g. "step". */
  itemWord: string;
  onMove: (from: number, to: number) => void;
  children: ReactNode;
}) {
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );
  const onDragEnd = ({ active, over }: DragEndEvent) => {
    if (over) onMove(ids.indexOf(String(active.id)), ids.indexOf(String(over.id)));
  };
  return (
    <DndContext
      sensors={sensors}
      collisionDetection={closestCenter}
      onDragEnd={onDragEnd}
      accessibility={{
        screenReaderInstructions: {
          draggable: `To move the ${itemWord}, press space, use the up and down arrows, then press space again.`,
        },
      }}
    >
      <SortableContext items={ids} strategy={verticalListSortingStrategy}>
        <ol aria-label={label} className="space-y-3">
          {children}
        </ol>
      </SortableContext>
    </DndContext>
  );
}

/** One entry: the card with its drag handle; the content comes as children. */
export function SortableItem({
  id,
  itemWord,
  number,
  canEdit,
  label,
  children,
}: {
  id: string;
  itemWord: string;
  number: number;
  canEdit: boolean;
  label?: string;
  children: ReactNode;
}) {
  const {
    attributes,
    listeners,
    setNodeRef,
    setActivatorNodeRef,
    transform,
    transition,
    isDragging,
  } = useSortable({ id, disabled: !canEdit });
  return (
    <li
      ref={setNodeRef}
      aria-label={label}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      className={`flex gap-3 rounded-card border-2 bg-white p-3 ${isDragging ? 'relative z-10 border-vat-600 shadow-card' : 'border-wool-300'}`}
    >
      {canEdit ? (
        <button
          ref={setActivatorNodeRef}
          type="button"
          aria-label={`Drag ${itemWord} ${number}`}
          className="flex min-h-12 w-12 shrink-0 cursor-grab touch-none items-center justify-center rounded-lg border-2 border-wool-300 text-2xl text-vat-800 active:cursor-grabbing"
          {...attributes}
          {...listeners}
        >
          <span aria-hidden="true">⠿</span>
        </button>
      ) : null}
      {children}
    </li>
  );
}

/** Up and down by one place, for the keyboard and for thumbs. */
export function MoveButtons({
  itemWord,
  number,
  isLast,
  onMove,
}: {
  itemWord: string;
  number: number;
  isLast: boolean;
  onMove: (by: -1 | 1) => void;
}) {
  return (
    <>
      <Button
        variant="secondary"
        disabled={number === 1}
        onClick={() => onMove(-1)}
        aria-label={`Move ${itemWord} ${number} up`}
      >
        ↑ Up
      </Button>
      <Button
        variant="secondary"
        disabled={isLast}
        onClick={() => onMove(1)}
        aria-label={`Move ${itemWord} ${number} down`}
      >
        ↓ Down
      </Button>
    </>
  );
}
