import { Spinner } from './Spinner.tsx';

/** A polite live region so screen readers hear what is loading. */
export function LoadingBlock({ label }: { label: string }) {
  return (
    <div role="status" className="flex min-h-32 items-center justify-center gap-3 p-6 text-vat-800">
      <Spinner />
      <span className="text-lg font-bold">{label}</span>
    </div>
  );
}
