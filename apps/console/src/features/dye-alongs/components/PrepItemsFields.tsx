import { Button } from '@vatside/ui/Button';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import {
  useFieldArray,
  type Control,
  type FieldErrors,
  type UseFormRegister,
} from 'react-hook-form';
import type { DyeAlongFormValues } from '../form-values.ts';

export const prepWhenNames = { dayBefore: 'The day before', hourBefore: 'An hour before' } as const;

/** The host's own prep items, added to what the run sheets already call for. */
export function PrepItemsFields({
  control,
  register,
  errors,
}: {
  control: Control<DyeAlongFormValues>;
  register: UseFormRegister<DyeAlongFormValues>;
  errors: FieldErrors<DyeAlongFormValues>;
}) {
  const items = useFieldArray({ control, name: 'hostPrepItems', keyName: 'key' });
  return (
    <fieldset className="space-y-3">
      <legend className="text-xl font-bold">Your own prep items</legend>
      <p className="text-vat-800">
        Soaking, mixing stocks and setting out tools come from the run sheets already; add what is
        special to this month.
      </p>
      {items.fields.map((item, index) => (
        <div key={item.key} className="flex flex-wrap items-end gap-3">
          <TextField
            label={`Prep item ${index + 1}`}
            className="min-w-64 flex-1"
            error={errors.hostPrepItems?.[index]?.text?.message}
            {...register(`hostPrepItems.${index}.text`)}
          />
          <SelectField
            label={`When, item ${index + 1}`}
            {...register(`hostPrepItems.${index}.when`)}
          >
            {Object.entries(prepWhenNames).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </SelectField>
          <Button variant="secondary" onClick={() => items.remove(index)}>
            Remove<span className="sr-only"> prep item {index + 1}</span>
          </Button>
        </div>
      ))}
      <Button
        variant="secondary"
        disabled={items.fields.length >= 30}
        onClick={() => items.append({ text: '', when: 'dayBefore' })}
      >
        Add a prep item
      </Button>
    </fieldset>
  );
}
