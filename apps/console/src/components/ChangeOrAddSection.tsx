import type { ReactNode } from 'react';
import { AddSection } from './AddSection.tsx';

/**
 * Under an editable list: the form for the row picked with "Change", titled for it, else the
 * form that adds a new one. `form` gets the picked row (undefined to add); key the form by the
 * row, so picking another row starts it afresh.
 */
export function ChangeOrAddSection<T>({
  editing,
  changeTitle,
  addTitle,
  form,
}: {
  editing: T | undefined;
  changeTitle: (row: T) => string;
  addTitle: string;
  form: (editing: T | undefined) => ReactNode;
}) {
  return (
    <AddSection title={editing === undefined ? addTitle : changeTitle(editing)}>
      {form(editing)}
    </AddSection>
  );
}
