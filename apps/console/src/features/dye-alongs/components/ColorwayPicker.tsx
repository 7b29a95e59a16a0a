import { Button } from '@vatside/ui/Button';
import { useController, type Control } from 'react-hook-form';
import type { DyeAlongFormValues } from '../form-values.ts';

export type ColorwayChoice = { id: string; name: string };

/** Which of the studio's colorways this month dyes, and in which order. */
export function ColorwayPicker({
  control,
  choices,
}: {
  control: Control<DyeAlongFormValues>;
  choices: ColorwayChoice[];
}) {
  const { field, fieldState } = useController({ control, name: 'colorwayIds' });
  const picked = field.value;
  const nameOf = (id: string) => choices.find((c) => c.id === id)?.name ?? 'A colorway';
  const set = (ids: string[]) => field.onChange(ids);
  const move = (from: number, to: number) => {
    const next = [...picked];
    const [id] = next.splice(from, 1);
    if (id) next.splice(to, 0, id);
    set(next);
  };

  return (
    <fieldset className="space-y-3">
      <legend className="text-xl font-bold">The month’s colorways</legend>
      {choices.length === 0 ? (
        <p>No colorways yet. Design one on the Colorways screen first.</p>
      ) : (
        <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {choices.map((choice) => (
            <label
              key={choice.id}
              className="flex min-h-12 items-center gap-3 rounded-xl border-2 border-vat-800 bg-white px-3 font-bold"
            >
              <input
                type="checkbox"
                className="size-6 accent-vat-800"
                checked={picked.includes(choice.id)}
                onChange={(event) =>
                  set(
                    event.target.checked
                      ? [...picked, choice.id]
                      : picked.filter((id) => id !== choice.id),
                  )
                }
              />
              {choice.name}
            </label>
          ))}
        </div>
      )}
      {picked.length > 0 ? (
        <div className="space-y-2">
          <p className="font-bold">Dyeing order</p>
          <ol className="space-y-2">
            {picked.map((id, index) => (
              <li
                key={id}
                className="flex flex-wrap items-center gap-2 rounded-xl border border-wool-200 bg-wool-50 p-2"
              >
                <span className="w-8 text-right font-bold">{index + 1}.</span>
                <span className="min-w-40 flex-1 font-bold">{nameOf(id)}</span>
                <Button
                  variant="secondary"
                  disabled={index === 0}
                  aria-label={`Dye ${nameOf(id)} earlier`}
                  onClick={() => move(index, index - 1)}
                >
                  <span aria-hidden="true">↑</span> Earlier
                </Button>
                <Button
                  variant="secondary"
                  disabled={index === picked.length - 1}
                  aria-label={`Dye ${nameOf(id)} later`}
                  onClick={() => move(index, index + 1)}
                >
                  <span aria-hidden="true">↓</span> Later
                </Button>
              </li>
            ))}
          </ol>
        </div>
      ) : null}
      {fieldState.error ? (
        <p className="font-bold text-madder-700">
          <span aria-hidden="true">✕ </span>
          {fieldState.error.message}
        </p>
      ) : null}
    </fieldset>
  );
}
