import type { ReactNode } from 'react';

/** The form-wide message: what the server said, or a note after saving. */
export function FormAlert({
  tone = 'problem',
  children,
}: {
  tone?: 'problem' | 'done';
  children: ReactNode;
}) {
  if (tone === 'done') {
    return (
      <p
        role="status"
        className="rounded-xl border-2 border-leaf-700 bg-leaf-100 p-4 font-bold text-leaf-800"
      >
        <span aria-hidden="true">✓ </span>
        {children}
      </p>
    );
  }
  return (
    <div
      role="alert"
      className="rounded-xl border-2 border-l-8 border-madder-700 bg-madder-100 p-4 font-bold text-madder-800"
    >
      {children}
    </div>
  );
}
