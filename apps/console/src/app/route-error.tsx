import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Button } from '@vatside/ui/Button';

/** Shown when a screen fails to load or throws while rendering. */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : undefined;

  return (
    <div role="alert" className="mx-auto max-w-xl space-y-4 p-6">
      <h1 className="font-display text-3xl font-semibold">This screen spilled over</h1>
      <p>Something went wrong while opening it. Reloading usually sets it right.</p>
      {detail ? <p className="text-sm text-vat-800">Detail: {detail}</p> : null}
      <Button onClick={() => window.location.reload()}>Reload</Button>
    </div>
  );
}
