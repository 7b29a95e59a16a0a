import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { clockOf } from '../zoned.ts';

/** When it starts on the reader's clock (large), the host's clock beside it, and what to tap. */
export function StartTime({ dyeAlong, timeZone }: { dyeAlong: PublicDyeAlong; timeZone: string }) {
  const mine = clockOf(dyeAlong.startsAt, timeZone);
  const host = clockOf(dyeAlong.startsAt, dyeAlong.hostTimeZone);
  const sameClock = mine.day === host.day && mine.time === host.time;
  return (
    <Card as="section" aria-labelledby="start-title" className="space-y-4">
      <h2 id="start-title" className="text-lg font-bold">
        Starts on your clock
      </h2>
      <p>
        <span className="block text-xl">{mine.day}</span>
        <span className="block font-display text-4xl font-semibold">
          {mine.time} <span className="text-2xl">{mine.zone}</span>
        </span>
        <span className="block text-sm text-vat-800">Your time zone: {timeZone}</span>
      </p>
      {sameClock ? null : (
        <p className="text-vat-800">
          The host’s clock: {host.day}, {host.time} {host.zone} ({dyeAlong.hostTimeZone})
        </p>
      )}
      <p>About {dyeAlong.expectedLengthMin} minutes.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        <a href={dyeAlong.calendarUrl} download className={buttonClass('primary', 'hand')}>
          Add to calendar
        </a>
        {dyeAlong.streamUrl ? (
          <a
            href={dyeAlong.streamUrl}
            target="_blank"
            rel="noopener noreferrer"
            className={buttonClass('secondary', 'hand')}
          >
            Open the stream<span className="sr-only"> (opens a new tab)</span>
          </a>
        ) : null}
      </div>
    </Card>
  );
}
