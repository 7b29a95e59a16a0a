import { Button, type ButtonProps } from './Button.tsx';

/** Matches the apps' ApiError without depending on them. */
export type ErrorLike = { message: string; code?: string };

export type ErrorPanelProps = {
  title: string;
  error: ErrorLike;
  onRetry?: () => void;
  retrying?: boolean;
  /** `hand` on phones, where the retry may be pressed with a knuckle. */
  retrySize?: ButtonProps['size'];
};

export function ErrorPanel({
  title,
  error,
  onRetry,
  retrying = false,
  retrySize = 'md',
}: ErrorPanelProps) {
  return (
    <div
      role="alert"
      className="rounded-card border-2 border-madder-700 border-l-8 bg-madder-100 p-5 text-madder-800"
    >
      <h2 className="font-display text-xl font-semibold">{title}</h2>
      <p className="mt-2 text-vat-950">{error.message}</p>
      {error.code ? <p className="mt-1 text-sm">Reference: {error.code}</p> : null}
      {onRetry ? (
        <Button
          variant="secondary"
          size={retrySize}
          className="mt-4"
          onClick={onRetry}
          disabled={retrying}
        >
          {retrying ? 'Trying again…' : 'Try again'}
        </Button>
      ) : null}
    </div>
  );
}
