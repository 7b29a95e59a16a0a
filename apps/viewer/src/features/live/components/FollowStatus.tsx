import type { Connection } from '../hooks/use-live-session.ts';
import type { WakeLockStatus } from '../hooks/use-wake-lock.ts';

const connectionWords: Record<Connection, string> = {
  connecting: 'Connecting…',
  online: 'Connected',
  offline: 'Offline',
};

const wakeWords: Record<WakeLockStatus, string> = {
  on: 'Screen stays on',
  off: 'Your phone may dim the screen',
  unsupported: 'Your phone may dim the screen',
};

/** One quiet line: is the phone connected, and will the screen stay on. */
export function FollowStatus({
  connection,
  wakeLock,
}: {
  connection: Connection;
  wakeLock: WakeLockStatus;
}) {
  return (
    <p className="flex flex-wrap gap-x-3 text-base font-bold text-vat-800">
      <span>{connectionWords[connection]}</span>
      <span aria-hidden="true">·</span>
      <span>{wakeWords[wakeLock]}</span>
    </p>
  );
}
