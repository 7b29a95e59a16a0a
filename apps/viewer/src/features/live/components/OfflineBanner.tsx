/**
 * Shown while the connection is down; timers keep counting from their end times meanwhile. The
 * live region stays in the page so the change is announced when the banner appears.
 */
export function OfflineBanner({ offline }: { offline: boolean }) {
  return (
    <div role="status" className="sticky top-0 z-10">
      {offline ? (
        <div className="border-b-4 border-madder-800 bg-madder-700 px-4 py-3 text-xl font-bold text-wool-50">
          Offline — reconnecting…
          <span className="block text-base font-normal">
            Timers keep counting. Your screen catches up as soon as the connection is back.
          </span>
        </div>
      ) : null}
    </div>
  );
}
