import { useEffect } from 'react';
import type { FieldValues, Path, UseFormSetFocus } from 'react-hook-form';

/**
 * A form opened from a row's "Change": focus goes to its first field, so the page moves to the
 * form wherever it sits, and a keyboard user starts typing there.
 */
export function useFocusWhenChanging<T extends FieldValues>(
  changing: boolean,
  setFocus: UseFormSetFocus<T>,
  field: Path<T>,
) {
  useEffect(() => {
    if (changing) setFocus(field);
  }, [changing, setFocus, field]);
}
